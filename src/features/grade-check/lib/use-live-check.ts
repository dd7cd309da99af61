import { useEffect, useMemo, useState } from 'react';
import { EngineInputError, type RuleProfile } from '@shared/engine';
import { parseInput } from '@shared/engine/errors';
import {
  gradeCheckInputsSchema,
  type GradeCheckInputs,
  type GradeCheckInputsInput,
  type GradeCheckResults,
} from '@shared/contracts/grade-checks';
import {
  checkWithoutProposal,
  fieldsOf,
  GradeCheckFieldsError,
  runGradeCheck,
  type Propose,
} from '@shared/grade-check/run-check';
import { buildInputs } from './build-inputs';
import { proposeInWorker } from './propose-in-worker';
import type { FieldErrors } from './read-number';
import type { SurveyState } from './survey-state';

export interface LiveCheck {
  /** What saving sends: the inputs as the form built them. */
  inputs?: GradeCheckInputsInput;
  errors: FieldErrors;
  results?: GradeCheckResults;
  /** Every box reads cleanly and the engine ran: the survey can be saved as a check. */
  ready: boolean;
  /** The design proposal asked for, still being worked out on its own thread. */
  designing?: boolean;
}

/** The engine's refusal under the form's field paths, exactly as the server's 400 names them. */
function refusedFields(error: unknown): FieldErrors {
  if (error instanceof GradeCheckFieldsError) return error.fields;
  if (error instanceof EngineInputError) return fieldsOf(error, '');
  throw error;
}

/**
 * The survey as typed, parsed by the contract's schema and checked by the shared grade check at once; a requested
 * design proposal comes back as `proposalWanted` (the parsed inputs) for runGradeCheck to finish on a worker.
 */
export function runLiveCheck(
  state: SurveyState,
  rules: RuleProfile | undefined,
): LiveCheck & { proposalWanted?: GradeCheckInputs } {
  const { inputs, errors: typed } = buildInputs(state, rules);
  if (!inputs || !rules) return { inputs, errors: typed, ready: false };
  const { parsed, errors: refused } = parseForLive(inputs);
  const errors = { ...typed, ...refused };
  if (!parsed) return { inputs, errors, ready: false };
  try {
    const { results, designRequest } = checkWithoutProposal(parsed, rules);
    const wanted = designRequest && (state.design.proposed || parsed.design?.applied) ? parsed : undefined;
    return { inputs, errors, results, proposalWanted: wanted, ready: Object.keys(errors).length === 0 && !wanted };
  } catch (error) {
    return { inputs, errors: { ...errors, ...refusedFields(error) }, ready: false };
  }
}

/**
 * The inputs as the server will parse them. A design part the server would refuse marks its boxes and leaves the
 * proposal out, but the checks of the entrance still run on the rest, as they do while a proposal is worked out.
 */
function parseForLive(inputs: GradeCheckInputsInput): { parsed?: GradeCheckInputs; errors: FieldErrors } {
  try {
    return { parsed: parseInput(gradeCheckInputsSchema, inputs), errors: {} };
  } catch (error) {
    const errors = refusedFields(error);
    const designOnly = Object.keys(errors).every((field) => field === 'design' || field.startsWith('design.'));
    if (!designOnly || !inputs.design) return { errors };
    const { design: _refused, ...rest } = inputs;
    try {
      return { parsed: parseInput(gradeCheckInputsSchema, rest), errors };
    } catch {
      return { errors };
    }
  }
}

type Answer = { results: GradeCheckResults; errors?: undefined } | { errors: FieldErrors; results?: undefined };

/** The whole check with its proposal: the same runGradeCheck the server records, here with the browser's runner. */
async function answerFor(inputs: GradeCheckInputs, rules: RuleProfile, propose: Propose): Promise<Answer> {
  try {
    return { results: await runGradeCheck(inputs, rules, propose) };
  } catch (error) {
    return { errors: refusedFields(error) };
  }
}

function withAnswer(live: LiveCheck, answer: Answer): LiveCheck {
  if (answer.errors) return { ...live, errors: { ...live.errors, ...answer.errors }, ready: false, designing: false };
  return { ...live, results: answer.results, ready: Object.keys(live.errors).length === 0, designing: false };
}

/** The whole live check with its proposal, for callers that can wait (tests, and the worker-backed hook). */
export async function runLiveCheckWithProposal(
  state: SurveyState,
  rules: RuleProfile | undefined,
  propose: Propose,
): Promise<LiveCheck> {
  const { proposalWanted, ...live } = runLiveCheck(state, rules);
  if (!proposalWanted || !rules) return live;
  return withAnswer(live, await answerFor(proposalWanted, rules, propose));
}

/**
 * Re-runs the check a moment after typing stops. The checks are quick and run here; the proposal runs on the
 * design Web Worker, and until it answers the check shows without it and cannot be saved.
 */
export function useLiveCheck(state: SurveyState, rules: RuleProfile | undefined, delayMs = 200): LiveCheck {
  const [settled, setSettled] = useState(state);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(state), delayMs);
    return () => clearTimeout(timer);
  }, [state, delayMs]);
  const { proposalWanted, ...live } = useMemo(() => runLiveCheck(settled, rules), [settled, rules]);
  const key = proposalWanted && rules ? JSON.stringify([proposalWanted, rules]) : undefined;
  const [answer, setAnswer] = useState<Answer & { key: string }>();
  useEffect(() => {
    if (!key || !proposalWanted || !rules) return;
    let current = true;
    void answerFor(proposalWanted, rules, proposeInWorker).then((a) => current && setAnswer({ key, ...a }));
    return () => {
      current = false;
    };
    // The key carries the inputs and the rules; the objects themselves change identity on every render.
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on their content, above
  }, [key]);
  if (!key) return live;
  if (answer?.key !== key) return { ...live, ready: false, designing: true };
  return withAnswer(live, answer);
}
