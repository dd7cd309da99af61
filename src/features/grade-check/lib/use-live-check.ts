import { useEffect, useMemo, useState } from 'react';
import { checkEntrance, EngineInputError, laserSetup, proposeProfile, type RuleProfile } from '@shared/engine';
import type { SavedCheck } from '../api/get-grade-checks';
import { buildInputs, type SavedInputs } from './build-inputs';
import type { FieldErrors } from './read-number';
import type { SurveyState } from './survey-state';

export type CheckResults = SavedCheck['results'];
export interface LiveCheck {
  inputs?: SavedInputs;
  errors: FieldErrors;
  results?: CheckResults;
  /** Every box reads cleanly and the engine ran: the survey can be saved as a check. */
  ready: boolean;
}

function engineErrors(error: unknown, prefix: string): FieldErrors {
  if (!(error instanceof EngineInputError)) throw error;
  const errors: FieldErrors = {};
  for (const issue of error.issues) errors[[prefix, issue.field].filter(Boolean).join('.')] ??= issue.message;
  return errors;
}

/** The same engine the server runs, on the survey as typed; the server's own run is the record. */
export function runLiveCheck(state: SurveyState, rules: RuleProfile | undefined): LiveCheck {
  const { inputs, errors } = buildInputs(state, rules);
  if (!inputs || !rules) return { inputs, errors, ready: false };
  const { road: _road, laser, design, ...check } = inputs;
  let step = '';
  try {
    const report = checkEntrance(check, rules);
    step = 'laser';
    const results: CheckResults = { report, laser: laser ? laserSetup(laser) : undefined };
    step = 'design';
    if (design && (state.design.proposed || design.applied)) {
      const { applied: _applied, haul: _haul, ...propose } = design;
      results.proposal = proposeProfile(propose, rules);
    }
    if (design?.applied) results.surveyed = checkEntrance({ ...check, profile: design.existing }, rules);
    return { inputs, errors, results, ready: Object.keys(errors).length === 0 };
  } catch (error) {
    return { inputs, errors: { ...errors, ...engineErrors(error, step) }, ready: false };
  }
}

/** Re-runs the check a moment after typing stops, so every keystroke does not solve the profile again. */
export function useLiveCheck(state: SurveyState, rules: RuleProfile | undefined, delayMs = 200): LiveCheck {
  const [settled, setSettled] = useState(state);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(state), delayMs);
    return () => clearTimeout(timer);
  }, [state, delayMs]);
  return useMemo(() => runLiveCheck(settled, rules), [settled, rules]);
}
