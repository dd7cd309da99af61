// Prints per-call timings of checkEntrance and proposeProfile on the same grounds, and their ratio. A script,
// not a test: timings vary by machine and are never asserted.
import { checkEntrance, commonRuralTemplate, proposeProfile, type RuleProfile } from '../../shared/engine/index';

interface Point {
  stationFt: number;
  elevationFt: number;
}

/** Rolling ground climbing about `climb`: deterministic, so every run times the same work. */
function rollingGround(stations: number, spacingFt: number, climb = 0.08): Point[] {
  return Array.from({ length: stations }, (_, i) => ({
    stationFt: i * spacingFt,
    elevationFt: 100 + climb * i * spacingFt + 1.5 * Math.sin(i / 9) + 0.4 * Math.sin(i / 2.3),
  }));
}

async function time(fn: () => unknown, runs: number, warmup: number): Promise<{ medianMs: number; p95Ms: number }> {
  for (let i = 0; i < warmup; i++) await fn();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    await fn();
    samples.push(performance.now() - t);
  }
  samples.sort((a, b) => a - b);
  const at = (q: number) => samples[Math.min(samples.length - 1, Math.ceil(q * samples.length) - 1)];
  return { medianMs: at(0.5), p95Ms: at(0.95) };
}

const drainage: RuleProfile = { ...commonRuralTemplate, minDrainageGradePercent: 1 };
// Three grounds: rolling ground climbing 8% (plain), a 22% bank the design must cut and bend to clear the car
// (clearance work), and level rolling ground under a 1% drainage minimum (drainage rule).
const grounds: [string, number, RuleProfile][] = [
  ['plain', 0.08, commonRuralTemplate],
  ['clearance work', 0.22, commonRuralTemplate],
  ['drainage rule', 0, drainage],
];

async function main() {
  for (const [stations, spacing, target, runs] of [[200, 2, 20, 7], [2000, 1, 100, 3]] as const) {
    for (const [name, climb, rules] of grounds) {
      const ground = rollingGround(stations, spacing, climb);
      const first = await proposeProfile({ existing: ground, roadEdgeElevationFt: 100 }, rules);
      if (!first.feasible) throw new Error(`benchmark ground "${name}" should be feasible: ${first.reason}`);
      const check = await time(() => checkEntrance({ profile: ground, scrapeStepFt: 0.1 }, rules), 20, 3);
      const propose = await time(() => proposeProfile({ existing: ground, roadEdgeElevationFt: 100 }, rules), runs, 1);
      const ratio = propose.medianMs / check.medianMs;
      console.log(
        `${stations} stations, ${name}: checkEntrance median ${check.medianMs.toFixed(1)} ms; proposeProfile median ` +
          `${propose.medianMs.toFixed(0)} ms, p95 ${propose.p95Ms.toFixed(0)} ms; ratio ${ratio.toFixed(0)}x ` +
          `(target ${target}x: ${ratio <= target ? 'within' : 'OVER'})`,
      );
    }
  }
}

await main();
