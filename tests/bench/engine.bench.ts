// Prints per-call timings for the two heavy engine calls and their ratio to a floor loop that only computes
// the segment grades of the same profile. A script, not a test: timings vary by machine and are never asserted.
import { checkEntrance, commonRuralTemplate, proposeProfile } from '../../shared/engine/index';

interface Point {
  stationFt: number;
  elevationFt: number;
}

/** Rolling ground climbing about 8%: deterministic, so every run times the same work. */
function rollingGround(stations: number, spacingFt: number, climb = 0.08): Point[] {
  return Array.from({ length: stations }, (_, i) => ({
    stationFt: i * spacingFt,
    elevationFt: 100 + climb * i * spacingFt + 1.5 * Math.sin(i / 9) + 0.4 * Math.sin(i / 2.3),
  }));
}

function floor(points: Point[]): number {
  let sum = 0;
  for (let i = 0; i < points.length - 1; i++) {
    sum += ((points[i + 1].elevationFt - points[i].elevationFt) / (points[i + 1].stationFt - points[i].stationFt)) * 100;
  }
  return sum;
}

function time(fn: () => unknown, runs: number, warmup: number): { medianMs: number; p95Ms: number } {
  for (let i = 0; i < warmup; i++) fn();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    fn();
    samples.push(performance.now() - t);
  }
  samples.sort((a, b) => a - b);
  const at = (q: number) => samples[Math.min(samples.length - 1, Math.ceil(q * samples.length) - 1)];
  return { medianMs: at(0.5), p95Ms: at(0.95) };
}

function report(label: string, targetMs: number, points: Point[], fn: () => unknown, runs: number) {
  const call = time(fn, runs, 5);
  const base = time(() => floor(points), Math.max(runs, 200), 20);
  const ratio = call.medianMs / Math.max(base.medianMs, 1e-6);
  const verdict = call.p95Ms <= targetMs ? 'within' : 'OVER';
  console.log(
    `${label}: median ${call.medianMs.toFixed(2)} ms, p95 ${call.p95Ms.toFixed(2)} ms ` +
      `(target ${targetMs} ms: ${verdict}); floor median ${(base.medianMs * 1000).toFixed(1)} us; ratio ${ratio.toFixed(0)}x`,
  );
}

const long = rollingGround(2000, 1);
report('checkEntrance, 2,000 stations, scrape step 0.1 ft', 20, long, () => checkEntrance({ profile: long, scrapeStepFt: 0.1 }, commonRuralTemplate), 50);

const medium = rollingGround(200, 2);
const first = proposeProfile({ existing: medium, roadEdgeElevationFt: 100 }, commonRuralTemplate);
if (!first.feasible) throw new Error(`benchmark profile should be feasible: ${first.reason}`);
report('proposeProfile, 200 stations', 200, medium, () => proposeProfile({ existing: medium, roadEdgeElevationFt: 100 }, commonRuralTemplate), 30);

// A bank steeper than the 17% limit: the proposal must cut, and usually re-solves to clear the scrape check.
const steep = rollingGround(200, 2, 0.22);
report('proposeProfile, 200 stations, 22% bank', 200, steep, () => proposeProfile({ existing: steep, roadEdgeElevationFt: 100 }, commonRuralTemplate), 30);
