import { useCallback, useEffect, useRef, useState } from 'react';
import { saveGradeCheckDraft } from '../api/save-grade-check-draft';
import type { SurveyState } from './survey-state';

/** Where the typed survey stands: on the server, waiting for a pause in typing or on its way, or refused. */
export type DraftState = { kind: 'kept'; at: Date | null } | { kind: 'waiting' } | { kind: 'failed'; error: unknown };

interface Sent {
  survey: SurveyState;
  versionId: string | null;
}

/**
 * Keeps the survey on the server a moment after typing stops. Saves run one after another and each sends the
 * newest form, so the last one to land is always the latest. `settle` sends what is waiting now and resolves once
 * everything has landed; `setBaseline` says this form needs no keeping (it was saved as a check, or started over).
 */
export function useDraftAutosave({
  requestId,
  survey,
  versionId,
  keptAt,
  delayMs = 1000,
}: {
  requestId: string;
  survey: SurveyState;
  versionId: string | null;
  keptAt: Date | null;
  delayMs?: number;
}) {
  // The form as opened, or as last saved as a check: only a survey typed past it is kept or warned about.
  const [baseline, setBaselineSurvey] = useState(survey);
  const [kept, setKept] = useState<{ survey: SurveyState; at: Date | null; error: unknown }>({
    survey,
    at: keptAt,
    error: null,
  });
  const latest = useRef<Sent | null>(null);
  const sent = useRef<Sent | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const chain = useRef<Promise<void>>(Promise.resolve());

  const send = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    chain.current = chain.current.then(async () => {
      const now = latest.current;
      if (!now || now === sent.current) return;
      try {
        const { draft } = await saveGradeCheckDraft({
          requestId,
          survey: now.survey as unknown as Record<string, unknown>,
          ruleProfileVersionId: now.versionId,
        });
        sent.current = now;
        setKept({ survey: now.survey, at: draft ? new Date(draft.updatedAt) : new Date(), error: null });
      } catch (error) {
        setKept((k) => ({ ...k, error }));
      }
    });
    return chain.current;
  }, [requestId]);

  useEffect(() => {
    if (survey === latest.current?.survey && versionId === latest.current?.versionId) return;
    latest.current = { survey, versionId };
    if (survey === baseline) return;
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => void send(), delayMs);
  }, [survey, versionId, baseline, delayMs, send]);

  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
    },
    [],
  );

  const settle = useCallback(() => send(), [send]);
  const setBaseline = useCallback(
    (form: SurveyState) => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = null;
      latest.current = { survey: form, versionId: latest.current?.versionId ?? versionId };
      sent.current = latest.current;
      setBaselineSurvey(form);
      setKept({ survey: form, at: null, error: null });
    },
    [versionId],
  );
  const onServer = survey === baseline || survey === kept.survey;
  const state: DraftState =
    kept.error && !onServer
      ? { kind: 'failed', error: kept.error }
      : !onServer
        ? { kind: 'waiting' }
        : { kind: 'kept', at: survey === kept.survey ? kept.at : null };
  /** Typed since the screen opened or since the last check was saved from it. */
  const changed = survey !== baseline;
  return { state, settle, setBaseline, changed };
}
