import { describe, expect, it } from 'vitest';
import { EngineInputError } from '@shared/engine';
import { fieldsOf } from '@shared/grade-check/run-check';

describe('engine complaints become the form’s own field paths', () => {
  it('names a value the user typed from the inputs’ root, as the form does', () => {
    const fields = fieldsOf(new EngineInputError('existing.1.elevationFt', 'must be at most 30000'), 'design', {
      existing: [],
    });
    expect(fields).toEqual({ 'design.existing.1.elevationFt': 'must be at most 30000' });
  });

  it('says a complaint about the engine’s own proposed points about the design part as a whole', () => {
    const fields = fieldsOf(new EngineInputError('design.2.elevationFt', 'must be at most 30000'), 'design', {
      existing: [],
      targetEndElevationFt: 29_999,
    });
    expect(fields).toEqual({
      design: 'no design profile can be made from these values (design.2.elevationFt: must be at most 30000)',
    });
  });

  it('passes anything else on untouched', () => {
    const other = new TypeError('not ours');
    expect(() => fieldsOf(other, '')).toThrow(other);
  });
});
