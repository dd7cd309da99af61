import type { ProfilePoint } from './profile';
import type { DesignVehicle } from './rule-profile';

// Measures of a design that the search uses to decide where to tighten, where to bend and which design to keep.

const TIGHTEN = 0.7;

/** The earth objective itself: |design - ground| integrated along the stations (trapezoids). */
export function earthMoved(ground: readonly ProfilePoint[], design: readonly ProfilePoint[]): number {
  let sum = 0;
  for (let i = 0; i < ground.length - 1; i++) {
    const a = Math.abs(design[i].elevationFt - ground[i].elevationFt);
    const b = Math.abs(design[i + 1].elevationFt - ground[i + 1].elevationFt);
    sum += ((a + b) / 2) * (ground[i + 1].stationFt - ground[i].stationFt);
  }
  return sum;
}

/** Lowers the clearance share of every window that could sit under the vehicle where it scraped. */
export function tighten(
  share: Float64Array,
  vertices: readonly ProfilePoint[],
  stationFt: number,
  v: DesignVehicle,
  local: boolean,
): void {
  const reach = v.wheelbaseFt + Math.max(v.frontOverhangFt, v.rearOverhangFt);
  let any = false;
  for (let i = 0; i < vertices.length; i++) {
    if (local && Math.abs(vertices[i].stationFt - stationFt) <= reach) {
      share[i] *= TIGHTEN;
      any = true;
    }
  }
  if (!any || !local) share.forEach((s, i) => (share[i] = s * TIGHTEN));
}

/** Breaks that use more than half of what one break may take under the vehicle: where a short curve may be cheaper. */
export function clearanceBreaks(design: readonly ProfilePoint[], v: DesignVehicle): number[] {
  const c = v.clearanceIn / 12;
  const crest = (4 * c) / v.wheelbaseFt;
  const overhang = Math.max(v.frontOverhangFt, v.rearOverhangFt);
  const sag = overhang > 0 ? c / overhang : Infinity;
  const out: number[] = [];
  for (let i = 1; i < design.length - 1; i++) {
    const g0 = (design[i].elevationFt - design[i - 1].elevationFt) / (design[i].stationFt - design[i - 1].stationFt);
    const g1 = (design[i + 1].elevationFt - design[i].elevationFt) / (design[i + 1].stationFt - design[i].stationFt);
    const a = g1 - g0;
    if (a < -crest / 2 || a > sag / 2) out.push(design[i].stationFt);
  }
  return out;
}

/** Rises and then falls at most once, so no low point holds water (the shape every design is given). */
export function drainsEverywhere(points: readonly ProfilePoint[]): boolean {
  let fallen = false;
  for (let i = 0; i < points.length - 1; i++) {
    const d = points[i + 1].elevationFt - points[i].elevationFt;
    if (d < 0) fallen = true;
    else if (d > 0 && fallen) return false;
  }
  return true;
}

/** The first station at the design's highest point: everything before it rises, everything after falls. */
export function crestStation(design: readonly ProfilePoint[]): number {
  const top = Math.max(...design.map((p) => p.elevationFt));
  return design.find((p) => p.elevationFt >= top - 1e-9)!.stationFt;
}
