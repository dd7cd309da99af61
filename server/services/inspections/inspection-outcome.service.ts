import { eq } from 'drizzle-orm';
import { itemLines, type InspectionOutcomeInput } from '@shared/contracts/inspections';
import { isOfficeRole, statusText } from '@shared/workflow/statuses';
import type { AppContext } from '../../config/context';
import { requestEvents, requests, users } from '../../db/schema';
import { conflict } from '../../lib/errors';
import { enqueueEmails } from '../email/outbox';
import { inspectionPassedEmails } from '../email/inspection-emails';
import { changeStatus } from '../transitions/change-status';
import { claimLinkOutcome, recordInspection } from '../transitions/inspection-state';
import type { InspectorLinkRow } from './inspector-links.service';

type OutcomeContext = Pick<AppContext, 'db' | 'env' | 's3'>;
type Outcome = Required<InspectionOutcomeInput>;

const notBuilt = (status: keyof typeof statusText) =>
  conflict(
    `The job is "${statusText[status].label}", so no inspection outcome can be recorded now. Contact the office.`,
  );

/**
 * A passed inspection is not a status change (the office closes the request), but it is written like one: the
 * inspection, a history entry the owner sees too and the e-mails to the office and the owner, in one transaction
 * with the request row locked.
 */
async function recordPassed(ctx: OutcomeContext, link: InspectorLinkRow, input: Outcome, now: Date) {
  return ctx.db.transaction(async (tx) => {
    const [row] = await tx.select().from(requests).where(eq(requests.id, link.requestId)).for('update');
    if (row.status !== 'built') throw notBuilt(row.status);
    await claimLinkOutcome(tx, row.id, link.id, now);
    const inspection = await recordInspection(tx, {
      requestId: row.id,
      passed: true,
      inspectorName: input.inspectorName,
      items: [],
      note: input.note,
      linkId: link.id,
      recordedById: null,
      createdAt: now,
    });
    const [event] = await tx
      .insert(requestEvents)
      .values({
        requestId: row.id,
        actorId: null,
        kind: 'inspection-passed',
        note: `Passed by the road authority’s inspector, ${input.inspectorName}.${input.note ? ` ${input.note}` : ''}`,
        createdAt: now,
      })
      .returning({ id: requestEvents.id });
    const [applicant] = await tx
      .select({ email: users.email, name: users.name })
      .from(users)
      .where(eq(users.id, row.applicantId));
    const emails = inspectionPassedEmails({
      request: row,
      applicant,
      officeEmail: ctx.env.OFFICE_EMAIL,
      inspectorName: input.inspectorName,
      note: input.note,
      appOrigin: ctx.env.APP_ORIGIN,
    });
    await enqueueEmails(
      tx,
      emails.map((e) => ({ ...e, eventId: event.id })),
    );
    await tx.update(requests).set({ updatedAt: now }).where(eq(requests.id, row.id));
    return inspection;
  });
}

/**
 * A failed inspection sends the job back to the crew: a status change, so it goes through the one door as the
 * office person who sent the link (the history says the inspector's name), and the link's outcome is taken in the
 * same transaction.
 */
async function recordFailed(ctx: OutcomeContext, link: InspectorLinkRow, input: Outcome) {
  const [sender] = await ctx.db
    .select({ id: users.id, email: users.email, name: users.name, role: users.role, disabled: users.disabled })
    .from(users)
    .where(eq(users.id, link.createdById));
  const [row] = await ctx.db.select().from(requests).where(eq(requests.id, link.requestId));
  if (row.status !== 'built') throw notBuilt(row.status);
  if (!sender || sender.disabled || !isOfficeRole(sender.role)) {
    throw conflict(
      'The office person who sent this link can no longer act for the office. Ask the office for a new link.',
    );
  }
  await changeStatus(
    ctx,
    sender,
    row.id,
    {
      action: 'fail-inspection',
      expectedVersion: row.version,
      inspectorName: input.inspectorName,
      items: input.items,
      note: input.note || undefined,
    },
    { inspectorLinkId: link.id },
  );
}

export async function recordOutcome(ctx: OutcomeContext, link: InspectorLinkRow, input: Outcome, now = new Date()) {
  if (input.outcome === 'passed') await recordPassed(ctx, link, input, now);
  else {
    if (itemLines(input.items).length === 0) throw conflict('List what must be fixed, one item per line.');
    await recordFailed(ctx, link, input);
  }
}
