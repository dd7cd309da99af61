import loadHighs from 'highs';
import { elevationAt, type DesignVehicle } from '@shared/engine';

interface Point {
  stationFt: number;
  elevationFt: number;
}

export interface OptimumCase {
  ground: Point[];
  roadEdgeFt: number;
  landingFt: number;
  landingMaxPercent: number;
  maxPercent: number;
  maxChangePercent: number;
  vehicle: DesignVehicle;
  /** Station spacing of the search grid; the wheelbase and overhangs must be whole multiples of it. */
  stepFt: number;
}

/**
 * An independent least-earth search for a rising driveway: a fine grid, and the clearance written out in full
 * rather than per break, as the height of every grid point above the straight body of the vehicle for every
 * wheel position on the grid, both overhangs either side (so driving in and out are both covered). Written as
 * CPLEX LP text and solved by HiGHS's one-shot parser, sharing no code with the proposal's model.
 */
export async function independentOptimum(c: OptimumCase, clearanceShare = 0.97): Promise<Point[]> {
  const first = c.ground[0].stationFt;
  const last = c.ground[c.ground.length - 1].stationFt;
  const n = Math.round((last - first) / c.stepFt) + 1;
  const x = Array.from({ length: n }, (_, i) => first + i * c.stepFt);
  const e = x.map((s) => elevationAt(c.ground, s));
  const h = c.stepFt;
  const wb = Math.round(c.vehicle.wheelbaseFt / h);
  const oh = Math.round(Math.max(c.vehicle.frontOverhangFt, c.vehicle.rearOverhangFt) / h);
  const clearance = (c.vehicle.clearanceIn / 12) * clearanceShare;
  const rows: string[] = [];
  const term = (k: number, v: string) => `${k >= 0 ? '+' : '-'} ${Math.abs(k)} ${v}`;
  for (let i = 0; i < n; i++) {
    rows.push(`z${i} - u${i} <= ${e[i]}`, `z${i} + u${i} >= ${e[i]}`);
  }
  for (let i = 0; i + 1 < n; i++) {
    const inLanding = x[i] < first + c.landingFt - 1e-9;
    const hi = (inLanding ? c.landingMaxPercent : c.maxPercent) / 100;
    rows.push(`z${i + 1} - z${i} <= ${hi * h}`, `z${i + 1} - z${i} >= 0`);
  }
  const change = (c.maxChangePercent / 100) * h;
  for (let i = 1; i + 1 < n; i++)
    rows.push(`z${i + 1} - 2 z${i} + z${i - 1} <= ${change}`, `z${i + 1} - 2 z${i} + z${i - 1} >= ${-change}`);
  // Ground point v above the line through the wheels at r and r + wb: z_v - z_r - (z_f - z_r)(v - r)/wb <= clearance.
  for (let r = 0; r + wb < n; r++) {
    const f = r + wb;
    for (let v = Math.max(0, r - oh); v <= Math.min(n - 1, f + oh); v++) {
      if (v === r || v === f) continue;
      const t = (v - r) / wb;
      rows.push(`z${v} ${term(-(1 - t), `z${r}`)} ${term(-t, `z${f}`)} <= ${clearance}`);
    }
  }
  const weights = x.map((_, i) => (i === 0 || i === n - 1 ? h / 2 : h));
  const lp = [
    'Minimize',
    ` obj: ${weights.map((w, i) => `${w} u${i}`).join(' + ')}`,
    'Subject To',
    ...rows.map((r, i) => ` c${i}: ${r}`),
    'Bounds',
    ...x.map((_, i) => (i === 0 ? ` z0 = ${c.roadEdgeFt}` : ` -1e6 <= z${i} <= 1e6`)),
    'End',
  ].join('\n');
  const highs = await loadHighs();
  const solved = highs.solve(lp, { output_flag: false });
  if (solved.Status !== 'Optimal') throw new Error(`independent search: ${solved.Status}`);
  return x.map((s, i) => ({ stationFt: s, elevationFt: solved.Columns[`z${i}`].Primal }));
}

/** |design - ground| integrated at a fine step, so designs on different stations compare on one measure. */
export function earthBetween(ground: Point[], design: Point[], stepFt = 0.05): number {
  const first = ground[0].stationFt;
  const last = ground[ground.length - 1].stationFt;
  const n = Math.round((last - first) / stepFt);
  let sum = 0;
  for (let k = 0; k < n; k++) {
    const s = first + (k + 0.5) * stepFt;
    sum += Math.abs(elevationAt(design, s) - elevationAt(ground, s)) * stepFt;
  }
  return sum;
}
