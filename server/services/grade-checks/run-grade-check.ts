import {
  checkEntrance, EngineInputError, laserSetup, type ProposedProfile, type ProposeProfileInput, type RuleProfile,
} from '../../../shared/engine';
import { proposeOffThread } from '../design/design-pool';
import { parseInput } from '../../../shared/engine/errors';
import { AppError } from '../../lib/errors';
import { gradeCheckInputsSchema, type GradeCheckInputs, type GradeCheckResults } from './grade-check-inputs';

/** Engine complaints name fields inside one part of the inputs; the API names them from the body's root. */
export function asBadRequest(error: unknown, prefix: string, given?: object): never {
  if (!(error instanceof EngineInputError)) throw error;
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    // A complaint about a value the engine made itself (the profile it proposes) is said about the part as a whole.
    const typed = !given || issue.field.split('.')[0] in given;
    const key = typed ? [prefix, issue.field].filter(Boolean).join('.') : prefix;
    fields[key] ??= typed ? issue.message : `no design profile can be made from these values (${issue.field}: ${issue.message})`;
  }
  const names = Object.keys(fields).join(', ');
  throw new AppError(400, 'invalid_input', `The survey cannot be checked as entered: ${names}.`, fields);
}

function attempt<T>(prefix: string, run: () => T, given?: object): T {
  try {
    return run();
  } catch (error) {
    asBadRequest(error, prefix, given);
  }
}

async function attemptAsync<T>(prefix: string, run: () => Promise<T>, given?: object): Promise<T> {
  try {
    return await run();
  } catch (error) {
    asBadRequest(error, prefix, given);
  }
}

export type Propose = (input: ProposeProfileInput, rules: RuleProfile) => Promise<ProposedProfile>;

/** Validates raw inputs with the engine's parser, which reports the profile form the user meant, not a vague union. */
export function parseGradeCheckInputs(raw: unknown): GradeCheckInputs {
  return attempt('inputs', () => parseInput(gradeCheckInputsSchema, raw));
}

/**
 * The record of a check: the engine run on the server from stored inputs and one rule profile version.
 * Deterministic, so running it again on the same inputs and profile gives the same results. The design
 * proposal runs in the design pool's worker threads unless the caller passes another runner.
 */
export async function runGradeCheck(inputs: GradeCheckInputs, profile: RuleProfile, propose: Propose = proposeOffThread): Promise<GradeCheckResults> {
  const { road: _road, laser, design, ...check } = inputs;
  const report = attempt('inputs', () => checkEntrance(check, profile));
  const results: GradeCheckResults = { report };
  if (laser) results.laser = attempt('inputs.laser', () => laserSetup(laser));
  if (design) {
    const { applied, haul: _haul, ...designInput } = design;
    results.proposal = await attemptAsync('inputs.design', () => propose(designInput, profile), designInput);
    if (applied) results.surveyed = attempt('inputs.design.existing', () => checkEntrance({ ...check, profile: design.existing }, profile));
  }
  return results;
}
