import type { RuleProfile } from '@shared/engine';
import { parseInput } from '@shared/engine/errors';
import { gradeCheckInputsSchema, type GradeCheckInputs, type GradeCheckResults } from '@shared/contracts/grade-checks';
import {
  fieldsOf,
  GradeCheckFieldsError,
  runGradeCheck as runCheck,
  type Propose,
} from '@shared/grade-check/run-check';
import { AppError } from '../../lib/errors';
import { proposeOffThread } from '../design/design-pool';

/** The engine's refusal as the API's 400: fields named by the form's own paths, the same ones the live check marks. */
function badRequestFrom(error: unknown): never {
  if (!(error instanceof GradeCheckFieldsError)) throw error;
  throw new AppError(400, 'invalid_input', error.message, error.fields);
}

/** Validates raw inputs with the engine's parser, which reports the profile form the user meant, not a vague union. */
export function parseGradeCheckInputs(raw: unknown): GradeCheckInputs {
  try {
    return parseInput(gradeCheckInputsSchema, raw);
  } catch (error) {
    return badRequestFrom(new GradeCheckFieldsError(fieldsOf(error, '')));
  }
}

/**
 * The record of a check: the shared runGradeCheck on the server, from stored inputs and one rule profile version.
 * The design proposal runs in the design pool's worker threads unless the caller passes another runner.
 */
export async function runGradeCheck(
  inputs: GradeCheckInputs,
  profile: RuleProfile,
  propose: Propose = proposeOffThread,
): Promise<GradeCheckResults> {
  try {
    return await runCheck(inputs, profile, propose);
  } catch (error) {
    return badRequestFrom(error);
  }
}
