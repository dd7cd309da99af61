import {
  checkEntrance,
  EngineInputError,
  laserSetup,
  type ProposedProfile,
  type ProposeProfileInput,
  type RuleProfile,
} from '../engine';
import type { GradeCheckInputs, GradeCheckResults } from '../contracts/grade-checks';

export type Propose = (input: ProposeProfileInput, rules: RuleProfile) => Promise<ProposedProfile>;
export type FieldErrors = Record<string, string>;

/** The engine refused part of the inputs; `fields` names the boxes by the form's own paths. */
export class GradeCheckFieldsError extends Error {
  constructor(readonly fields: FieldErrors) {
    super(`The survey cannot be checked as entered: ${Object.keys(fields).join(', ')}.`);
    this.name = 'GradeCheckFieldsError';
  }
}

/**
 * Engine complaints name fields inside the part it was given; the form names them from the inputs' root. A complaint
 * about a value the engine made itself (the profile it proposes) is said about the part as a whole.
 */
export function fieldsOf(error: unknown, part: string, given?: object): FieldErrors {
  if (!(error instanceof EngineInputError)) throw error;
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const typed = !given || issue.field.split('.')[0] in given;
    const key = typed ? [part, issue.field].filter(Boolean).join('.') : part;
    fields[key] ??= typed
      ? issue.message
      : `no design profile can be made from these values (${issue.field}: ${issue.message})`;
  }
  return fields;
}

function attempt<T>(part: string, run: () => T): T {
  try {
    return run();
  } catch (error) {
    throw new GradeCheckFieldsError(fieldsOf(error, part));
  }
}

/** The check's checks without its design proposal, which is the one slow call; `designRequest` is what to propose from. */
export interface CheckedNow {
  results: GradeCheckResults;
  designRequest?: ProposeProfileInput;
}

export function checkWithoutProposal(inputs: GradeCheckInputs, rules: RuleProfile): CheckedNow {
  const { road: _road, plan: _plan, laser, design, ...check } = inputs;
  const results: GradeCheckResults = { report: attempt('', () => checkEntrance(check, rules)) };
  if (laser) results.laser = attempt('laser', () => laserSetup(laser));
  if (!design) return { results };
  const { applied, haul: _haul, ...designPart } = design;
  if (applied)
    results.surveyed = attempt('design.existing', () => checkEntrance({ ...check, profile: design.existing }, rules));
  // The proposal is held to the road-edge break and scrape the check itself applies with the road side typed.
  const designRequest = { ...designPart, roadSide: designPart.roadSide ?? check.roadSide };
  return { results, designRequest };
}

/** The proposal for a design request, its complaint said about the design's fields. */
export async function proposalFor(
  designRequest: ProposeProfileInput,
  rules: RuleProfile,
  propose: Propose,
): Promise<ProposedProfile> {
  try {
    return await propose(designRequest, rules);
  } catch (error) {
    throw new GradeCheckFieldsError(fieldsOf(error, 'design', designRequest));
  }
}

/**
 * A grade check from its inputs and one rule profile: the entrance report, the laser setup, the design proposal and,
 * when the proposal was applied, the ground as surveyed. The browser's live check and the server's saved record both
 * run this; the server stores exactly what it returns. Deterministic for the same inputs and profile. Throws
 * GradeCheckFieldsError for inputs the engine refuses.
 */
export async function runGradeCheck(
  inputs: GradeCheckInputs,
  rules: RuleProfile,
  propose: Propose,
): Promise<GradeCheckResults> {
  const { results, designRequest } = checkWithoutProposal(inputs, rules);
  if (!designRequest) return results;
  return { ...results, proposal: await proposalFor(designRequest, rules, propose) };
}
