import { snap } from './numbers';

export type FindingStatus = 'pass' | 'fail' | 'advisory' | 'not-checked';

/**
 * One rule checked. `margin` is always "room to spare": positive inside the limit, negative beyond it,
 * whichever way the limit points (a maximum or a minimum).
 */
export interface Finding {
  ruleId: string;
  label: string;
  measured: number | null;
  limit: number | null;
  margin: number | null;
  unit: string;
  status: FindingStatus;
  /** Which way the limit points: the measured value may be at most, or must be at least, the limit. */
  limitKind?: 'at-most' | 'at-least';
  stationFt?: number;
  note?: string;
  ruleProfileId?: string;
  ruleProfileVersion?: string | number;
}

interface FindingBase {
  ruleId: string;
  label: string;
  unit: string;
  stationFt?: number;
  note?: string;
}

export function atMost(base: FindingBase, measured: number, limit: number): Finding {
  const margin = snap(limit - measured);
  return { ...base, measured, limit, margin, limitKind: 'at-most', status: margin >= 0 ? 'pass' : 'fail' };
}

export function atLeast(base: FindingBase, measured: number, limit: number): Finding {
  const margin = snap(measured - limit);
  return { ...base, measured, limit, margin, limitKind: 'at-least', status: margin >= 0 ? 'pass' : 'fail' };
}

export function notChecked(base: FindingBase, why: string): Finding {
  return { ...base, measured: null, limit: null, margin: null, status: 'not-checked', note: why };
}

export function advisory(base: FindingBase, measured: number | null, limit: number | null, why: string): Finding {
  const margin = measured === null || limit === null ? null : snap(limit - measured);
  return { ...base, measured, limit, margin, status: 'advisory', note: why };
}
