import { and, eq } from 'drizzle-orm';
import { statusText } from '@shared/workflow/statuses';
import { actionLabel, findTransition, type Transition, type TransitionAction } from '@shared/workflow/transitions';
import type { TransitionBody, TransitionBodyOf } from '@shared/workflow/transition-inputs';
import type { SessionUser } from '../../lib/session-user';
import type { Tx } from '../../db/client';
import { requestEvents, requests, users } from '../../db/schema';
import { conflict, forbidden } from '../../lib/errors';
import { emailsForTransition } from '../email/transition-emails';
import { enqueueEmails } from '../email/outbox';
import { calendarAttachment } from '../email/calendar-invite';
import { loadVisibleRequest, type RequestRow } from '../requests/request-access';
import type { ActionDef, ActionResult, TransitionVia, TransitionContext } from './action-def';
import { actionDefs } from './registry';

export type { TransitionContext };

/**
 * The status change itself, in a single transaction: lock the row, check the action is allowed from its current
 * status for this role and that the caller saw the latest version, run the action's own checks and writes, then
 * write the status with what the action returned, an event row and the e-mails the change triggers.
 */
export async function applyTransition(
  ctx: TransitionContext,
  actor: SessionUser,
  requestId: string,
  body: TransitionBody,
  via: TransitionVia = {},
  prepared?: unknown,
) {
  return ctx.db.transaction(async (tx) => {
    const row = await loadVisibleRequest(tx, actor, requestId, { forUpdate: true });
    const transition = findTransition(row.status, body.action);
    if (!transition) {
      throw conflict(
        `This request is "${statusText[row.status].label}"; "${actionLabel(body.action)}" is not possible from there.`,
      );
    }
    if (!transition.roles.includes(actor.role)) throw forbidden(`Your role cannot "${transition.label}".`);
    if (row.version !== body.expectedVersion) {
      throw conflict(
        `Someone else changed this request (now version ${row.version}, you had ${body.expectedVersion}). Reload to see the latest.`,
      );
    }
    const now = new Date();
    const def = actionDefs[body.action] as ActionDef<TransitionAction>;
    const added: ActionResult =
      (await def.run?.({
        tx,
        row,
        body: body as TransitionBodyOf<TransitionAction>,
        actor,
        now,
        timeZone: ctx.env.OFFICE_TIME_ZONE,
        via,
        prepared,
      })) ?? {};
    const [updated] = await tx
      .update(requests)
      .set({ ...added.patch, status: transition.to, version: row.version + 1, statusChangedAt: now, updatedAt: now })
      .where(and(eq(requests.id, row.id), eq(requests.version, row.version)))
      .returning();
    const note = (added.note ?? body.note ?? '').trim();
    const ownerReadsNote = !def.emails.noteTo || def.emails.noteTo.includes('applicant');
    const [event] = await tx
      .insert(requestEvents)
      .values({
        requestId: row.id,
        actorId: actor.id,
        kind: 'transition',
        fromStatus: row.status,
        toStatus: transition.to,
        note: ownerReadsNote ? note : '',
      })
      .returning({ id: requestEvents.id });
    // A note the owner may not read goes on the office's side of the history only.
    if (!ownerReadsNote && note) {
      await tx
        .insert(requestEvents)
        .values({ requestId: row.id, actorId: actor.id, kind: 'crew-note', note, internal: true });
    }
    await enqueueEmails(
      tx,
      await transitionEmails(tx, ctx, {
        transition,
        def,
        row: updated,
        note,
        detail: added.emailDetail,
        eventId: event.id,
        ownerCalendar: added.ownerCalendar,
      }),
    );
    return { request: updated, eventId: event.id, transition };
  });
}

interface Sent {
  transition: Transition;
  def: ActionDef<TransitionAction>;
  row: RequestRow;
  note: string;
  detail?: string;
  eventId: number;
  ownerCalendar?: ActionResult['ownerCalendar'];
}

async function transitionEmails(
  tx: Tx,
  ctx: TransitionContext,
  { transition, def, row, note, detail, eventId, ownerCalendar }: Sent,
) {
  const person = { email: users.email, name: users.name };
  const [applicant] = await tx.select(person).from(users).where(eq(users.id, row.applicantId));
  const [crew] = row.crewId ? await tx.select(person).from(users).where(eq(users.id, row.crewId)) : [];
  const crewLeads = def.emails.to.includes('crewLeads')
    ? await tx
        .select(person)
        .from(users)
        .where(and(eq(users.role, 'crew'), eq(users.disabled, false)))
    : [];
  return emailsForTransition({
    transition,
    audiences: def.emails.to,
    noteTo: def.emails.noteTo,
    ownerNoteLead: def.emails.ownerNoteLead,
    ownerReceipt: def.emails.ownerReceipt,
    request: row,
    note,
    applicant,
    officeEmail: ctx.env.OFFICE_EMAIL,
    crew,
    crewLeads,
    appOrigin: ctx.env.APP_ORIGIN,
    detail,
  }).map((email) => {
    // The owner's invitation rides with the owner's e-mail only; the office has the request itself.
    if (!ownerCalendar || email.to !== applicant.email) return { ...email, eventId };
    const invite = calendarAttachment({
      ...ownerCalendar,
      location: row.siteAddress,
      organizer: { name: 'Gradepass office', email: ctx.env.OFFICE_EMAIL },
    });
    return { ...email, eventId, attachments: [invite] };
  });
}
