import { and, desc, eq, isNotNull } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { gradeChecks, jobs } from '../../db/schema';
import { badRequest, conflict } from '../../lib/errors';
import type { RequestRow } from '../requests/request-access';
import type { ActionDef, ActionStep } from './action-def';
import { lastAsBuiltSet } from './as-built-state';
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

export const bookVisit: ActionDef<'book-visit'> = {
  emails: { to: ['applicant'] },
  run: async ({ body }) => ({ patch: { visitAt: new Date(body.visitAt) } }),
};

export const markChecked: ActionDef<'mark-checked'> = {
  emails: { to: ['applicant'] },
  run: async ({ tx, row }) => {
    const check = await attachedGradeCheck(tx, row.id);
    if (!check) throw conflict('Attach a grade check to this request before marking it checked.');
    return { emailDetail: `Grade check: ${check.summary}` };
  },
};

/** The packet sent with the application is stored first, then recorded with the filing and linked from the timeline. */
export const filePermit: ActionDef<'file-permit'> = {
  emails: { to: ['applicant'] },
  prepare: (ctx, { actor, requestId, body }) => packetForFiling(ctx, actor, requestId, body),
  discard: (ctx, prepared) => discardStoredPacket(ctx, prepared as FilingPacket),
  run: async ({ tx, row, body, actor, prepared }) => {
    if (prepared) await recordFiledPacket(tx, actor, row.id, body.permitReference, prepared as FilingPacket);
    return { patch: { permitReference: body.permitReference } };
  },
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

export const close: ActionDef<'close'> = {
  emails: { to: ['applicant', 'crew'] },
  // Closing over failing readings is the office's call to make, but on the record: it says why.
  run: async ({ tx, row, body }) => {
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
};

export const decline: ActionDef<'decline'> = { emails: { to: ['applicant'] } };
