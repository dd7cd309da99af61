import { initialSurvey, newKey, type SurveyState } from './survey-state';

const isGroup = (v: unknown): v is Record<string, unknown> => Boolean(v) && typeof v === 'object' && !Array.isArray(v);

const text = (v: unknown) => (typeof v === 'string' ? v : '');

/**
 * The form as kept in a draft, laid over a fresh form so a draft from an older screen (missing a newer box) still
 * opens. Rows get new keys, so they never clash with rows added after the restore.
 */
export function surveyFromDraft(saved: Record<string, unknown>, speedMph?: number | null): SurveyState {
  const base = initialSurvey(speedMph);
  const part = <K extends keyof SurveyState>(k: K): SurveyState[K] => {
    const v = saved[k];
    return isGroup(v) ? ({ ...base[k], ...v } as SurveyState[K]) : base[k];
  };
  const centreline = part('centreline');
  const laser = part('laser');
  return {
    road: part('road'),
    centreline: {
      ...centreline,
      rows: Array.isArray(centreline.rows)
        ? (centreline.rows as unknown[])
            .filter(isGroup)
            .map((r) => ({ key: newKey(), station: text(r.station), value: text(r.value) }))
        : base.centreline.rows,
    },
    culvert: part('culvert'),
    plan: part('plan'),
    geometry: part('geometry'),
    laser: {
      ...laser,
      stakes: Array.isArray(laser.stakes)
        ? (laser.stakes as unknown[]).filter(isGroup).map((s) => ({
            key: newKey(),
            label: text(s.label),
            offsetFt: text(s.offsetFt),
            distanceFt: text(s.distanceFt),
            rodReadingFt: text(s.rodReadingFt),
          }))
        : base.laser.stakes,
    },
    apron: part('apron'),
    design: part('design'),
  };
}
