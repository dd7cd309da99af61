import { describe, expect, it } from 'vitest';
import { formFieldsOf, transitionInputSchema, transitionInputs } from '@shared/workflow/transition-inputs';
import { transitionActions, transitions } from '@shared/workflow/transitions';

describe('each status change’s shared input', () => {
  it('exists for every action of the table, and names its own action', () => {
    expect(Object.keys(transitionInputs).sort()).toEqual([...transitionActions].sort());
    for (const t of transitions) expect(transitionInputs[t.action].shape.action.value).toBe(t.action);
  });

  it('gives every field the person types a label, so the form can show it and a 400 names it', () => {
    for (const action of transitionActions) {
      const typed = Object.keys(transitionInputs[action].shape).filter(
        (name) => name !== 'action' && name !== 'expectedVersion',
      );
      expect(
        formFieldsOf(action)
          .map((f) => f.name)
          .sort(),
        action,
      ).toEqual(typed.sort());
    }
  });

  it('asks for the reason on a decline and for the questions when asking for details, and for nothing on a release', () => {
    expect(formFieldsOf('decline').find((f) => f.name === 'note')).toMatchObject({
      required: true,
      text: { label: 'Reason' },
    });
    expect(formFieldsOf('ask-details').find((f) => f.name === 'note')).toMatchObject({ required: true });
    expect(formFieldsOf('release').every((f) => !f.required)).toBe(true);
    expect(formFieldsOf('record-granted').map((f) => f.name)).toEqual([
      'permitReference',
      'permitDecidedOn',
      'permitConditions',
      'permitExpiresOn',
      'note',
    ]);
  });

  it('refuses an action outside the table by name, and a field another action takes', () => {
    const unknown = transitionInputSchema.safeParse({ action: 'fly', expectedVersion: 1 });
    expect(unknown.success).toBe(false);
    expect(unknown.error?.issues[0]).toMatchObject({
      path: ['action'],
      message: expect.stringContaining('must be one of: submit'),
    });
    const stray = transitionInputSchema.safeParse({
      action: 'release',
      expectedVersion: 1,
      visitAt: '2027-01-04T09:00:00Z',
    });
    expect(stray.success).toBe(false);
  });
});
