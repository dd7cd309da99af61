import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../shared/engine';
import { AppError } from '../../server/lib/errors';
import { asBadRequest } from '../../server/services/grade-checks/run-grade-check';

const fieldsOf = (run: () => never) => {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(AppError);
    return (error as AppError).fields;
  }
  throw new Error('expected a 400');
};

describe('engine complaints become fields of the request body', () => {
  it('names a value the user typed from the body’s root', () => {
    const fields = fieldsOf(() => asBadRequest(new EngineInputError('existing.1.elevationFt', 'must be at most 30000'), 'inputs.design', { existing: [] }));
    expect(fields).toEqual({ 'inputs.design.existing.1.elevationFt': 'must be at most 30000' });
  });

  it('says a complaint about the engine’s own proposed points about the design part as a whole', () => {
    const fields = fieldsOf(() => asBadRequest(new EngineInputError('design.2.elevationFt', 'must be at most 30000'), 'inputs.design', { existing: [], targetEndElevationFt: 29_999 }));
    expect(fields).toEqual({ 'inputs.design': 'no design profile can be made from these values (design.2.elevationFt: must be at most 30000)' });
  });

  it('passes anything else on untouched', () => {
    const other = new TypeError('not ours');
    expect(() => asBadRequest(other, 'inputs')).toThrow(other);
  });
});
