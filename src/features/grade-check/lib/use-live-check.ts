import { useEffect, useMemo, useState } from 'react';
import { checkEntrance, EngineInputError, laserSetup, type ProposedProfile, type ProposeProfileInput, type RuleProfile } from '@shared/engine';
import type { SavedCheck } from '../api/get-grade-checks';
import { buildInputs, type SavedInputs } from './build-inputs';
import { proposeInWorker } from './propose-in-worker';
import type { FieldErrors } from './read-number';
import type { SurveyState } from './survey-state';

export type CheckResults = SavedCheck['results'];
export interface LiveCheck {
  inputs?: SavedInputs;
  errors: FieldErrors;
  results?: CheckResults;
  /** Every box reads cleanly and the engine ran: the survey can be saved as a check. */
  ready: boolean;
  /** The design proposal asked for, still being worked out on its own thread. */
  designing?: boolean;
}

type Propose = (input: ProposeProfileInput, rules: RuleProfile) => Promise<ProposedProfile>;

function engineErrors(error: unknown, prefix: string): FieldErrors {
  if (!(error instanceof EngineInputError)) throw error;
  const errors: FieldErrors = {};
  for (const issue of error.issues) errors[[prefix, issue.field].filter(Boolean).join('.')] ??= issue.message;
  return errors;
}

/**
 * The same engine the server runs, on the survey as typed; the server's own run is the record. The checks
 * run here at once; a requested design proposal is returned as `designRequest` for a worker to solve.
 */
export function runLiveCheck(state: SurveyState, rules: RuleProfile | undefined): LiveCheck & { designRequest?: ProposeProfileInput } {
  const { inputs, errors } = buildInputs(state, rules);
  if (!inputs || !rules) return { inputs, errors, ready: false };
  const { road: _road, laser, design, ...check } = inputs;
  let step = '';
  try {
    const report = checkEntrance(check, rules);
    step = 'laser';
    const results: CheckResults = { report, laser: laser ? laserSetup(laser) : undefined };
    step = 'design';
    let designRequest: ProposeProfileInput | undefined;
    if (design && (state.design.proposed || design.applied)) {
      const { applied: _applied, haul: _haul, ...propose } = design;
      designRequest = propose;
    }
    if (design?.applied) results.surveyed = checkEntrance({ ...check, profile: design.existing }, rules);
    return { inputs, errors, results, designRequest, ready: Object.keys(errors).length === 0 && !designRequest };
  } catch (error) {
    return { inputs, errors: { ...errors, ...engineErrors(error, step) }, ready: false };
  }
}

/** The proposal's answer folded into a live check: its result, or its complaint under the design's fields. */
function withProposal(live: LiveCheck, answer: { proposal?: ProposedProfile; errors?: FieldErrors }): LiveCheck {
  if (answer.errors) return { ...live, errors: { ...live.errors, ...answer.errors }, ready: false, designing: false };
  const results = live.results && { ...live.results, proposal: answer.proposal };
  return { ...live, results, ready: Object.keys(live.errors).length === 0, designing: false };
}

async function answerFor(request: ProposeProfileInput, rules: RuleProfile, propose: Propose) {
  try {
    return { proposal: await propose(request, rules) };
  } catch (error) {
    return { errors: engineErrors(error, 'design') };
  }
}

/** The whole live check with its proposal, for callers that can wait (tests, and the worker-backed hook). */
export async function runLiveCheckWithProposal(state: SurveyState, rules: RuleProfile | undefined, propose: Propose): Promise<LiveCheck> {
  const { designRequest, ...live } = runLiveCheck(state, rules);
  if (!designRequest || !rules) return live;
  return withProposal(live, await answerFor(designRequest, rules, propose));
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
  const { designRequest, ...live } = useMemo(() => runLiveCheck(settled, rules), [settled, rules]);
  const key = designRequest && rules ? JSON.stringify([designRequest, rules]) : undefined;
  const [answer, setAnswer] = useState<{ key: string; proposal?: ProposedProfile; errors?: FieldErrors }>();
  useEffect(() => {
    if (!key || !designRequest || !rules) return;
    let current = true;
    void answerFor(designRequest, rules, proposeInWorker).then((a) => current && setAnswer({ key, ...a }));
    return () => {
      current = false;
    };
    // The key carries the request and the rules; the objects themselves change identity on every render.
  }, [key]);
  if (!key) return live;
  if (answer?.key !== key) return { ...live, ready: false, designing: true };
  return withProposal(live, answer);
}
