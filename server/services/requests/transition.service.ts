import { and, eq } from 'drizzle-orm';
import { statusText } from '../../../shared/workflow/statuses';
import { findTransition, type Transition } from '../../../shared/workflow/transitions';
import type { SessionUser } from '../../auth/session-user';
import type { Db, Tx } from '../../db/client';
import { requestEvents, requests, users } from '../../db/schema';
import { conflict, forbidden } from '../../lib/errors';
import { emailsForTransition } from '../email/transition-emails';
import { enqueueEmails } from '../email/outbox';
import { loadVisibleRequest, type RequestRow } from './request-access';

export interface TransitionInput {
  requestId: string;
  action: string;
  /** The version the caller read; a stale one is refused with 409 and nothing is written. */
  expectedVersion: number;
  note?: string;
  /** Extra words for the e-mails, e.g. the grade check's summary. */
  emailDetail?: string;
  /** Columns the transition sets besides the status (visit date, permit reference...). */
  patch?: Partial<typeof requests.$inferInsert>;
  /** Checks and writes that must happen in the same transaction, after the request is locked. */
  within?: (tx: Tx, row: RequestRow, transition: Transition) => Promise<void>;
}

export interface TransitionContext { db: Db; officeEmail: string; appOrigin: string }

/**
 * The one way a request changes status: in a single transaction, lock the row, check the action is allowed from
 * its current status for this role and that the caller saw the latest version, write the status, an event row
 * and the e-mails the change triggers.
 */
export async function applyTransition(ctx: TransitionContext, actor: SessionUser, input: TransitionInput) {
  return ctx.db.transaction(async (tx) => {
    const row = await loadVisibleRequest(tx, actor, input.requestId, { forUpdate: true });
    const transition = findTransition(row.status, input.action);
    if (!transition) {
      throw conflict(`This request is "${statusText[row.status].label}" (${row.status}); "${input.action}" is not possible from there.`);
    }
    if (!transition.roles.includes(actor.role)) throw forbidden(`Your role cannot "${transition.label}".`);
    if (row.version !== input.expectedVersion) {
      throw conflict(`Someone else changed this request (now version ${row.version}, you had ${input.expectedVersion}). Reload to see the latest.`);
    }
    await input.within?.(tx, row, transition);
    const now = new Date();
    const [updated] = await tx.update(requests)
      .set({ ...input.patch, status: transition.to, version: row.version + 1, statusChangedAt: now, updatedAt: now })
      .where(and(eq(requests.id, row.id), eq(requests.version, row.version)))
      .returning();
    const note = input.note?.trim() ?? '';
    const [event] = await tx.insert(requestEvents).values({
      requestId: row.id, actorId: actor.id, kind: 'transition', fromStatus: row.status, toStatus: transition.to, note,
    }).returning({ id: requestEvents.id });
    await enqueueEmails(tx, await transitionEmails(tx, ctx, transition, updated, note, input.emailDetail, event.id));
    return { request: updated, eventId: event.id, transition };
  });
}

async function transitionEmails(tx: Tx, ctx: TransitionContext, transition: Transition, row: RequestRow, note: string, detail: string | undefined, eventId: number) {
  const [applicant] = await tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, row.applicantId));
  const [crew] = row.crewId ? await tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, row.crewId)) : [];
  const crewLeads = transition.action === 'release'
    ? await tx.select({ email: users.email, name: users.name }).from(users).where(and(eq(users.role, 'crew'), eq(users.disabled, false)))
    : [];
  return emailsForTransition({
    transition, request: row, note, applicant, officeEmail: ctx.officeEmail, crew, crewLeads, appOrigin: ctx.appOrigin, detail,
  }).map((email) => ({ ...email, eventId }));
}
