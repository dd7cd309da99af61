import { and, eq, isNotNull } from 'drizzle-orm';
import type { AppContext } from '../../config/context';
import { documents, requestEvents, requests, users } from '../../db/schema';
import { PACKET_KIND, recordFiledPacket, storePacketForFiling } from '../../services/permits/permit-packet.service';

/**
 * Every demo request whose permit was filed gets the packet the filing sent, made, stored and recorded exactly as
 * recording "permit filed" in the app does, and dated with that filing. The seed writes rows only, so this runs once
 * storage is up; a request that already has its packet is left alone.
 */
export async function seedDemoPackets(ctx: Pick<AppContext, 'db' | 's3' | 'env'>) {
  const filed = await ctx.db
    .select({ request: requests, event: requestEvents, actor: users })
    .from(requests)
    .innerJoin(requestEvents, and(eq(requestEvents.requestId, requests.id), eq(requestEvents.toStatus, 'permit_filed')))
    .innerJoin(users, eq(users.id, requestEvents.actorId))
    .where(isNotNull(requests.permitReference));
  let made = 0;
  for (const { request, event, actor } of filed) {
    const [existing] = await ctx.db
      .select({ id: documents.id })
      .from(documents)
      .where(and(eq(documents.requestId, request.id), eq(documents.kind, PACKET_KIND)));
    if (existing) continue;
    const office = { id: actor.id, email: actor.email, name: actor.name, role: actor.role };
    const reference = request.permitReference ?? undefined;
    const packet = await storePacketForFiling(ctx, office, request.id, {
      permitReference: reference,
      paperSize: 'letter',
    });
    await ctx.db.transaction(async (tx) => {
      const document = await recordFiledPacket(tx, office, request.id, reference, packet);
      if (!document) return;
      await tx.update(documents).set({ createdAt: event.createdAt }).where(eq(documents.id, document.id));
      await tx
        .update(requestEvents)
        .set({ createdAt: event.createdAt })
        .where(and(eq(requestEvents.documentId, document.id), eq(requestEvents.kind, PACKET_KIND)));
    });
    made += 1;
  }
  return made;
}
