import { z } from 'zod';
import { dayInput, momentInput } from '../../../shared/workflow/dates';
import { transitions, type TransitionNeed } from '../../../shared/workflow/transitions';
import type { requests } from '../../db/schema';
import { AppError } from '../../lib/errors';

const knownActions = [...new Set(transitions.map((t) => t.action))];
const text = (max: number) => z.string().trim().max(max, `must be at most ${max} characters`);

export const transitionInputSchema = z.strictObject({
  action: z.string().refine((a) => knownActions.includes(a), { message: `must be one of: ${knownActions.join(', ')}` }),
  expectedVersion: z.number('must be the version number you loaded').int().min(1),
  note: text(4000).optional(),
  answer: text(8000).optional(),
  visitAt: momentInput('must be a date and time, e.g. 2026-05-04T09:30:00Z').optional(),
  permitReference: text(80).optional(),
  permitDecidedOn: dayInput('must be a date, e.g. 2026-05-04').optional(),
  permitConditions: text(4000).optional(),
  permitExpiresOn: dayInput('must be a date, e.g. 2027-05-04').optional(),
});
export type TransitionBody = z.infer<typeof transitionInputSchema>;

/** Every row of one action asks for the same things, so the needs can be checked before the request is read. */
export function needsOf(action: string): readonly TransitionNeed[] {
  return transitions.find((t) => t.action === action)?.needs ?? [];
}

const required = (value: string | undefined) => value !== undefined && value.length > 0;

/**
 * Checks that the body carries what the action needs and turns it into the note and the columns to set.
 * Missing pieces come back as one 400 naming every field, so the form can mark them all at once.
 */
export function readNeeds(body: TransitionBody, now = new Date()) {
  const needs = needsOf(body.action);
  const fields: Record<string, string> = {};
  const patch: Partial<typeof requests.$inferInsert> = {};
  let note = body.note ?? '';

  if (needs.includes('reason') && !required(body.note)) fields.note = 'give the reason, in words the property owner will read';
  if (needs.includes('questions') && !required(body.note)) fields.note = 'write the questions for the property owner';
  if (needs.includes('note') && !required(body.note)) fields.note = 'say what needs doing';
  if (needs.includes('answer')) {
    if (!required(body.answer)) fields.answer = 'write your answer to the office';
    else if (!note) note = body.answer ?? '';
  }
  if (needs.includes('visitDate')) {
    if (!body.visitAt) fields.visitAt = 'pick the date and time of the site visit';
    else {
      const at = new Date(body.visitAt);
      const dayMs = 86_400_000;
      if (at.getTime() < now.getTime() - dayMs) fields.visitAt = 'must not be in the past';
      else if (at.getTime() > now.getTime() + 400 * dayMs) fields.visitAt = 'must be within the next 13 months';
      else patch.visitAt = at;
    }
  }
  if (needs.includes('permit')) readPermit(body, fields, patch);

  if (Object.keys(fields).length > 0) {
    throw new AppError(400, 'invalid_input', `"${body.action}" needs: ${Object.keys(fields).join(', ')}.`, fields);
  }
  return { note, patch };
}

function readPermit(body: TransitionBody, fields: Record<string, string>, patch: Partial<typeof requests.$inferInsert>) {
  if (body.permitReference) patch.permitReference = body.permitReference;
  if (body.action === 'file-permit') {
    if (!required(body.permitReference)) fields.permitReference = 'enter the road authority’s application number';
    return;
  }
  // Recording the decision: the filing usually gave the reference already, so it is only checked against the row.
  if (!body.permitDecidedOn) fields.permitDecidedOn = 'enter the date the road authority decided';
  else patch.permitDecidedOn = body.permitDecidedOn;
  if (body.permitConditions !== undefined) patch.permitConditions = body.permitConditions;
  if (body.permitExpiresOn !== undefined) {
    if (body.permitDecidedOn && body.permitExpiresOn <= body.permitDecidedOn) fields.permitExpiresOn = 'must be after the decision date';
    else patch.permitExpiresOn = body.permitExpiresOn;
  }
}
