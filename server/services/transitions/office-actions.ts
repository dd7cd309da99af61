import { formatMoment } from '@shared/format/when';
import { visitUid } from '../email/calendar-invite';
import { and, desc, eq, isNotNull } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { gradeChecks, jobs } from '../../db/schema';
import { itemLines } from '@shared/contracts/inspections';
import { badRequest, conflict } from '../../lib/errors';
import type { RequestRow } from '../requests/request-access';
import type { ActionDef, ActionStep } from './action-def';
import { lastAsBuiltSet } from './as-built-state';
import { explainPaymentWait, requirePaid } from './payment-waits';
import { claimLinkOutcome, jobNeedsInspection, latestInspection, recordInspection } from './inspection-state';
import {
  discardStoredPacket,
  packetForFiling,
  recordFiledPacket,
  type MissingPacket,
  type StoredPacket,
} from '../permits/permit-packet.service';

type FilingPacket = StoredPacket | MissingPacket;

async function attachedGradeCheck(tx: Tx, requestId: string) {
  const [check] = await tx
    .select({ id: gradeChecks.id, summary: gradeChecks.summary, passed: gradeChecks.passed })
    .from(gradeChecks)
    .where(and(eq(gradeChecks.requestId, requestId), isNotNull(gradeChecks.attachedAt)))
    .orderBy(desc(gradeChecks.attachedAt))
    .limit(1);
  return check;
}

/** A decision usually follows the filing, which gave the reference; then it is only checked against the row. */
function permitDecision(
  { row, body }: ActionStep<'record-granted' | 'record-refused'>,
  extra: Partial<RequestRow> = {},
) {
  if (!body.permitReference && !row.permitReference) {
    throw badRequest('Enter the permit reference.', { permitReference: 'enter the road authority’s permit number' });
  }
  return {
    patch: {
      permitDecidedOn: body.permitDecidedOn,
      ...(body.permitReference ? { permitReference: body.permitReference } : {}),
      ...extra,
    },
  };
}

export const askDetails: ActionDef<'ask-details'> = {
  emails: { to: ['applicant'], ownerNoteLead: 'The office asks:' },
};

const visitTitle = (reference: string) => `Site visit for your driveway entrance (${reference})`;
const visitWords =
  'The office comes to measure the road edge, the ditch and the ground where the entrance will go. You do not need to be home; please leave the entrance area clear.';

/** Each visit e-mail carries the visit's one invitation: the same id every time, its revision raised each time. */
export const bookVisit: ActionDef<'book-visit'> = {
  emails: { to: ['applicant'] },
  run: async ({ body, row, timeZone }) => {
    const at = new Date(body.visitAt);
    return {
      patch: { visitAt: at, visitSequence: row.visitSequence + 1 },
      emailDetail: `Site visit: ${formatMoment(at, timeZone)}. A calendar invitation is attached.`,
      ownerCalendar: {
        uid: visitUid(row.id),
        sequence: row.visitSequence,
        cancelled: false,
        when: { at, minutes: 60 },
        title: visitTitle(row.reference),
        description: visitWords,
      },
    };
  },
};

export const rescheduleVisit: ActionDef<'reschedule-visit'> = {
  emails: { to: ['applicant'] },
  run: async ({ body, row, timeZone }) => {
    const at = new Date(body.visitAt);
    const before = row.visitAt ? ` (it was ${formatMoment(row.visitAt, timeZone)})` : '';
    return {
      patch: { visitAt: at, visitSequence: row.visitSequence + 1 },
      emailDetail: `The site visit moves to ${formatMoment(at, timeZone)}${before}. The attached invitation updates your calendar.`,
      ownerCalendar: {
        uid: visitUid(row.id),
        sequence: row.visitSequence,
        cancelled: false,
        when: { at, minutes: 60 },
        title: visitTitle(row.reference),
        description: visitWords,
      },
    };
  },
};

export const cancelVisit: ActionDef<'cancel-visit'> = {
  emails: { to: ['applicant'] },
  run: async ({ row, timeZone }) => {
    const at = row.visitAt ?? new Date();
    return {
      patch: { visitAt: null, visitSequence: row.visitSequence + 1 },
      emailDetail: `The site visit of ${formatMoment(at, timeZone)} is called off. The office will book a new one; the attached notice removes it from your calendar.`,
      ownerCalendar: {
        uid: visitUid(row.id),
        sequence: row.visitSequence,
        cancelled: true,
        when: { at, minutes: 60 },
        title: visitTitle(row.reference),
        description: 'Called off by the office.',
      },
    };
  },
};

export const markChecked: ActionDef<'mark-checked'> = {
  emails: { to: ['applicant'] },
  run: async ({ tx, row }) => {
    const check = await attachedGradeCheck(tx, row.id);
    if (!check) throw conflict('Attach a grade check to this request before marking it checked.');
    return { emailDetail: `Grade check: ${check.summary}` };
  },
};

/**
 * The packet sent with the application is stored first, then recorded with the filing and linked from the timeline.
 * A filing that waits for the deposit is refused before any packet is drawn; the locked check in `run` stays.
 */
export const filePermit: ActionDef<'file-permit'> = {
  emails: { to: ['applicant'] },
  prepare: async (ctx, { actor, requestId, body }) => {
    await requirePaid(ctx.db, requestId, 'file-permit');
    return packetForFiling(ctx, actor, requestId, body);
  },
  discard: (ctx, prepared) => discardStoredPacket(ctx, prepared as FilingPacket),
  run: async ({ tx, row, body, actor, prepared }) => {
    await requirePaid(tx, row.id, 'file-permit');
    if (prepared) await recordFiledPacket(tx, actor, row.id, body.permitReference, prepared as FilingPacket);
    return { patch: { permitReference: body.permitReference } };
  },
  explainRefusal: explainPaymentWait('file-permit', 'checked'),
};

export const recordGranted: ActionDef<'record-granted'> = {
  emails: { to: ['applicant'] },
  run: async (step) =>
    permitDecision(step, {
      ...(step.body.permitConditions !== undefined ? { permitConditions: step.body.permitConditions } : {}),
      ...(step.body.permitExpiresOn !== undefined ? { permitExpiresOn: step.body.permitExpiresOn } : {}),
    }),
};

export const recordRefused: ActionDef<'record-refused'> = {
  emails: { to: ['applicant'] },
  run: async (step) => permitDecision(step),
};

export const release: ActionDef<'release'> = {
  // The release note is written for the crews; the owner is told the job reached the board, not what the office told the crew.
  emails: { to: ['applicant', 'crewLeads'], noteTo: ['crewLeads'] },
  run: async ({ tx, row, now }) => {
    const check = await attachedGradeCheck(tx, row.id);
    await tx
      .insert(jobs)
      .values({ requestId: row.id, gradeCheckId: check?.id ?? null })
      .onConflictDoUpdate({
        target: jobs.requestId,
        set: { releasedAt: now, crewId: null, acceptedAt: null, gradeCheckId: check?.id ?? null },
      });
  },
};

export const sendBack: ActionDef<'send-back'> = { emails: { to: ['crew'] } };

/**
 * The road authority's inspector failed the entrance (on their own page, or the office records what they said):
 * the job goes back to the crew with the items to fix, and everyone involved reads them.
 */
export const failInspection: ActionDef<'fail-inspection'> = {
  emails: { to: ['applicant', 'office', 'crew'] },
  run: async ({ tx, row, body, actor, now, via }) => {
    const items = itemLines(body.items);
    if (items.length === 0) {
      throw badRequest('List what must be fixed, one item per line.', {
        items: 'What must be fixed: list at least one item, one per line',
      });
    }
    const linkId = via.inspectorLinkId ?? null;
    if (linkId) await claimLinkOutcome(tx, row.id, linkId, now);
    const note = (body.note ?? '').trim();
    await recordInspection(tx, {
      requestId: row.id,
      passed: false,
      inspectorName: body.inspectorName,
      items,
      note,
      linkId,
      recordedById: linkId ? null : actor.id,
      createdAt: now,
    });
    const list = items.map((item) => `- ${item}`).join('\n');
    return {
      note: `Inspection failed (inspector: ${body.inspectorName}). To fix:\n${list}${note ? `\n${note}` : ''}`,
      emailDetail: `The road authority’s inspector, ${body.inspectorName}, did not pass the entrance. The crew goes back to fix it.`,
    };
  },
};

export const close: ActionDef<'close'> = {
  emails: { to: ['applicant', 'crew'] },
  // Closing over failing readings is the office's call to make, but on the record: it says why.
  run: async ({ tx, row, body }) => {
    await requirePaid(tx, row.id, 'close');
    if (await jobNeedsInspection(tx, row.id)) {
      const inspection = await latestInspection(tx, row.id);
      if (!inspection?.passed) {
        throw conflict(
          inspection
            ? 'The road authority’s rules ask for a passed inspection before closing, and the last inspection failed. Send the inspector a link once the crew has fixed it.'
            : 'The road authority’s rules ask for a passed inspection before closing. Send the inspector a link and wait for the outcome.',
        );
      }
    }
    const set = await lastAsBuiltSet(tx, row.id);
    if (set && !set.passed && !body.note) {
      throw badRequest(
        'The crew’s last as-built readings fail the rule profile: write a closing note saying why the request closes anyway.',
        {
          note: 'Closing note: say why the request closes although the as-built readings fail',
        },
      );
    }
  },
  explainRefusal: explainPaymentWait('close', 'built'),
};

export const decline: ActionDef<'decline'> = { emails: { to: ['applicant'] } };
