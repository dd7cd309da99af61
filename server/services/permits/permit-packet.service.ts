import { DeleteObjectCommand } from '@aws-sdk/client-s3';
import { and, desc, eq, isNotNull } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import type { RuleProfile } from '@shared/engine';
import { roadOwnerText } from '@shared/requests/choices';
import type { PacketPaperSize } from '@shared/workflow/transition-inputs';
import type { AppContext } from '../../config/context';
import type { DbOrTx, Tx } from '../../db/client';
import { documents, gradeChecks, jurisdictions, requestEvents, ruleProfileVersions } from '../../db/schema';
import { AppError, conflict } from '../../lib/errors';
import { StoredGradeCheckError } from '@shared/grade-check/stored-check';
import type { SessionUser } from '../../lib/session-user';
import { readGradeCheckRow } from '../grade-checks/grade-checks.service';
import { loadVisibleRequest, type RequestRow } from '../requests/request-access';
import { buildPermitPacket, type PacketData } from '../reports/permit-packet';
import { storeReport } from '../reports/report-storage';

export const PACKET_KIND = 'permit-packet';
const paperWords: Record<PacketPaperSize, string> = { letter: 'Letter', a4: 'A4' };

function whereText(site: Record<string, unknown>): string {
  if (site.positionKind === 'landmark' && typeof site.landmark === 'string') {
    const ft = typeof site.distanceFromLandmarkFt === 'number' ? `${site.distanceFromLandmarkFt} ft from ` : 'near ';
    return `${ft}${site.landmark}`;
  }
  if (typeof site.siteLat === 'number' && typeof site.siteLng === 'number')
    return `at ${site.siteLat.toFixed(5)}, ${site.siteLng.toFixed(5)}`;
  return '';
}

/** What the packet is made from: the request, its attached grade check (the latest) and that check's rule profile. */
async function packetData(
  db: DbOrTx,
  env: AppContext['env'],
  row: RequestRow,
  paper: PacketPaperSize,
  permitReference: string | null,
): Promise<PacketData & { checkId: string }> {
  const [checkRow] = await db
    .select()
    .from(gradeChecks)
    .where(and(eq(gradeChecks.requestId, row.id), isNotNull(gradeChecks.attachedAt)))
    .orderBy(desc(gradeChecks.attachedAt))
    .limit(1);
  if (!checkRow) throw conflict('Attach a grade check to this request before making its permit packet.');
  let check;
  try {
    check = readGradeCheckRow(checkRow);
  } catch (error) {
    if (!(error instanceof StoredGradeCheckError)) throw error;
    throw conflict(
      `The attached grade check ${checkRow.number} cannot be read (${error.message}); attach a check saved again to make the packet.`,
    );
  }
  const [version] = await db
    .select()
    .from(ruleProfileVersions)
    .where(eq(ruleProfileVersions.id, check.ruleProfileVersionId));
  const [jurisdiction] = await db.select().from(jurisdictions).where(eq(jurisdictions.id, version.jurisdictionId));
  const site = ((row.application ?? {}) as { site?: Record<string, unknown> }).site ?? {};
  const owner =
    typeof site.roadOwner === 'string' && site.roadOwner in roadOwnerText
      ? roadOwnerText[site.roadOwner as keyof typeof roadOwnerText]
      : '';
  return {
    checkId: check.id,
    request: {
      reference: row.reference,
      applicantName: row.applicantName,
      siteAddress: row.siteAddress,
      roadName: row.roadName,
      permitReference,
      parcelNumber: typeof site.parcelNumber === 'string' ? site.parcelNumber : '',
      roadOwner: owner,
      whereText: whereText(site),
    },
    check,
    profile: { ...(version.profile as RuleProfile), jurisdictionName: jurisdiction.name, version: version.version },
    version,
    jurisdiction,
    company: `the contractor's office (${env.OFFICE_EMAIL})`,
    preparedOn: new Date(),
    paper,
  };
}

/** The packet as it would be filed now, for the office to read before filing. */
export async function previewPacket(
  ctx: Pick<AppContext, 'db' | 'env'>,
  user: SessionUser,
  requestId: string,
  paper: PacketPaperSize,
) {
  const row = await loadVisibleRequest(ctx.db, user, requestId);
  const pdf = await buildPermitPacket(await packetData(ctx.db, ctx.env, row, paper, row.permitReference));
  return { pdf, fileName: `permit-packet-${row.reference}-${paper}.pdf` };
}

/** A packet stored before the filing's transaction, recorded by it (or removed if the filing is refused). */
export interface StoredPacket {
  kind: 'stored';
  objectKey: string;
  sizeBytes: number;
  gradeCheckId: string;
  paper: PacketPaperSize;
}

/**
 * Makes the packet the filing sends and puts it in storage. Runs before the status change's transaction, so no row
 * is locked while the PDF is drawn and stored; the change then records it (recordFiledPacket).
 */
export async function storePacketForFiling(
  ctx: Pick<AppContext, 'db' | 's3' | 'env'>,
  actor: SessionUser,
  requestId: string,
  body: { permitReference?: string; paperSize?: PacketPaperSize },
): Promise<StoredPacket> {
  const row = await loadVisibleRequest(ctx.db, actor, requestId);
  const paper = body.paperSize ?? 'letter';
  const data = await packetData(ctx.db, ctx.env, row, paper, body.permitReference ?? null);
  const pdf = await buildPermitPacket(data);
  const objectKey = `reports/${row.id}/permit-packet-${randomUUID()}.pdf`;
  await storeReport(ctx, objectKey, pdf);
  return { kind: 'stored', objectKey, sizeBytes: pdf.length, gradeCheckId: data.checkId, paper };
}

/** Why no packet could be made for a filing: the office may have filed on paper, so the filing is still recorded. */
export interface MissingPacket {
  kind: 'missing';
  reason: string;
}

/**
 * The packet for a filing, or why there is none (no attached check, or one no reader can use). A request moved to
 * "checked" always has an attached check, but one may have been withdrawn since; recording the filing is not held up.
 */
export async function packetForFiling(
  ctx: Pick<AppContext, 'db' | 's3' | 'env'>,
  actor: SessionUser,
  requestId: string,
  body: { permitReference?: string; paperSize?: PacketPaperSize },
): Promise<StoredPacket | MissingPacket> {
  try {
    return await storePacketForFiling(ctx, actor, requestId, body);
  } catch (error) {
    if (error instanceof AppError && error.status === 409) return { kind: 'missing', reason: error.message };
    throw error;
  }
}

/** A packet stored for a filing that did not happen is taken out of storage again; failing that, it only takes room. */
export async function discardStoredPacket(ctx: Pick<AppContext, 's3' | 'env'>, packet: StoredPacket | MissingPacket) {
  if (packet.kind !== 'stored') return;
  await ctx.s3.send(new DeleteObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: packet.objectKey })).catch(() => {});
}

/** Inside the filing's transaction: the stored packet becomes the request's document, linked from the timeline. */
export async function recordFiledPacket(
  tx: Tx,
  actor: SessionUser,
  requestId: string,
  permitReference: string | undefined,
  packet: StoredPacket | MissingPacket,
) {
  if (packet.kind === 'missing') {
    await tx.insert(requestEvents).values({
      requestId,
      actorId: actor.id,
      kind: PACKET_KIND,
      internal: true,
      note: `No permit packet was stored with this filing: ${packet.reason}`,
    });
    return null;
  }
  const [document] = await tx
    .insert(documents)
    .values({
      requestId,
      gradeCheckId: packet.gradeCheckId,
      kind: PACKET_KIND,
      title: permitReference ? `Permit packet, application ${permitReference}` : 'Permit packet',
      objectKey: packet.objectKey,
      contentType: 'application/pdf',
      sizeBytes: packet.sizeBytes,
      createdById: actor.id,
    })
    .returning();
  await tx.insert(requestEvents).values({
    requestId,
    actorId: actor.id,
    kind: PACKET_KIND,
    internal: true,
    documentId: document.id,
    note: `Permit packet (${paperWords[packet.paper]}) sent with application ${permitReference ?? '(no reference)'}.`,
  });
  return document;
}
