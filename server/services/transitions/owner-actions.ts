import { messages } from '../../db/schema';
import { assertReadyToSubmit } from '../requests/submission';
import type { ActionDef } from './action-def';

/** The homeowner's own moves: send, answer the office's questions, withdraw. */
export const submit: ActionDef<'submit'> = {
  emails: { to: ['applicant', 'office'], ownerReceipt: true },
  run: async ({ row, now }) => {
    await assertReadyToSubmit(row);
    return { patch: { submittedAt: now } };
  },
};

export const answer: ActionDef<'answer'> = {
  emails: { to: ['office'] },
  // The answer is a message in the thread as well as the note of the change, so the office reads it in either place.
  run: async ({ tx, row, body, actor }) => {
    await tx
      .insert(messages)
      .values({ requestId: row.id, authorId: actor.id, visibility: 'shared', body: body.answer });
    return { note: body.note || body.answer };
  },
};

export const withdraw: ActionDef<'withdraw'> = { emails: { to: ['office'] } };
