import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { fieldLabelOf, fieldLabelsOf, fieldsSentence } from '@shared/contracts/field-labels';
import { fieldLabel, plainIssueMessage } from '@shared/errors/issue-words';
import { parseInput } from '@shared/engine/errors';
import { EngineInputError, ruleProfileSchema } from '@shared/engine';
import { transitionInputSchema } from '@shared/workflow/transition-inputs';
import { scheduleJobInputSchema } from '@shared/crew/crew-inputs';

const firstIssue = (schema: z.ZodType, value: unknown) => {
  const result = schema.safeParse(value);
  if (result.success) throw new Error('expected a refusal');
  return result.error.issues[0];
};

describe('the one mapping from a refusal to plain words', () => {
  it("rewrites zod's stock messages", () => {
    expect(plainIssueMessage(firstIssue(z.number().max(50), 51))).toBe('must be 50 or less');
    expect(plainIssueMessage(firstIssue(z.number().positive(), 0))).toBe('must be more than 0');
    expect(plainIssueMessage(firstIssue(z.number().min(1), 0))).toBe('must be 1 or more');
    expect(plainIssueMessage(firstIssue(z.string().max(10), 'x'.repeat(11)))).toBe('must be at most 10 characters');
    expect(plainIssueMessage(firstIssue(z.string().min(1), ''))).toBe('must be filled in');
    expect(plainIssueMessage(firstIssue(z.object({ a: z.string() }), {}))).toBe('must be filled in');
    expect(plainIssueMessage(firstIssue(z.number(), 'x'))).toBe('must be a number');
    expect(plainIssueMessage(firstIssue(z.enum(['a', 'b']), 'c'))).toBe('is not one of the choices offered');
    expect(plainIssueMessage(firstIssue(z.email(), 'nope'))).toMatch(/e-mail address/);
    const refusals: [z.ZodType, unknown][] = [
      [z.number().max(50), 51],
      [z.string().min(3), 'ab'],
      [z.boolean(), 'yes'],
      [z.uuid(), 'not-an-id'],
      [z.strictObject({}), { extra: 1 }],
      [z.iso.date(), '2026-13-01'],
    ];
    for (const [schema, value] of refusals)
      expect(plainIssueMessage(firstIssue(schema, value))).not.toMatch(/Too big|Too small|Invalid|expected|<=/);
  });

  it('keeps a message the schema wrote itself', () => {
    expect(plainIssueMessage(firstIssue(z.number().max(5, 'Posted speeds are at most 5.'), 6))).toBe(
      'Posted speeds are at most 5.',
    );
  });

  it('gives the engine the same words', () => {
    const err = (() => {
      try {
        parseInput(ruleProfileSchema, { landing: { lengthFt: 20, minGradePercent: 0, maxGradePercent: 80 } });
      } catch (e) {
        return e as EngineInputError;
      }
    })();
    expect(err).toBeInstanceOf(EngineInputError);
    const landing = err!.issues.find((i) => i.field === 'landing.maxGradePercent');
    expect(landing?.message).toBe('must be 50 or less');
  });

  it('names a field by the label its form shows', () => {
    // A status change's fields carry their labels; the action sent picks which form's "note" it is.
    expect(fieldLabelOf('permitExpiresOn', transitionInputSchema, { action: 'record-granted' })).toBe(
      'Permit expires on',
    );
    expect(fieldLabelOf('note', transitionInputSchema, { action: 'record-refused' })).toBe('Reason');
    expect(fieldLabelOf('note', transitionInputSchema, { action: 'hand-back' })).toBe(
      'Why does it go back on the board?',
    );
    expect(fieldLabelOf('date', scheduleJobInputSchema)).toBe('Work day');
    // Rule profile values by the profile form's labels, with or without the body's "profile." prefix.
    expect(fieldLabelOf('profile.landing.maxGradePercent')).toBe('Landing: steepest rise away from the road');
    expect(fieldLabelOf('asBuilt.elevationToleranceFt')).toBe('Elevation tolerance');
    expect(fieldLabelOf('profile.sources.maxGradePercent')).toBe(
      'Source for maximum driveway grade beyond the landing',
    );
    // Shared names and the last resort.
    expect(fieldLabelOf('sizeBytes')).toBe('File size');
    expect(fieldLabelOf('culvert.diameterIn')).toBe('Diameter (in)');
    expect(fieldLabelOf('readings.2.stationFt')).toBe('Reading 3: Station (ft)');
    const labelled = z.object({ colour: z.string().register(fieldLabel, { label: 'Colour of the gate' }) });
    expect(fieldLabelOf('colour', labelled)).toBe('Colour of the gate');
  });

  it('says a 400 in one sentence by label, never by key', () => {
    const one = { permitExpiresOn: 'must be after the decision date' };
    expect(fieldsSentence(one, fieldLabelsOf(one, transitionInputSchema, { action: 'record-granted' }))).toBe(
      'Permit expires on: must be after the decision date.',
    );
    const two = { sizeBytes: 'The file is empty.', fileName: 'must be filled in' };
    const sentence = fieldsSentence(two, fieldLabelsOf(two));
    expect(sentence).toBe('Please check 2 fields: File size (The file is empty); File name (must be filled in).');
    expect(sentence).not.toMatch(/sizeBytes|fileName/);
  });
});
