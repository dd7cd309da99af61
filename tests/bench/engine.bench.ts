// Prints per-call timings of checkEntrance and proposeProfile on the same grounds, and their ratio. A script,
// not a test: timings vary by machine and are never asserted.
import { checkEntrance, commonRuralTemplate, proposeProfile, type RuleProfile } from '@shared/engine/index';

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

const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

/** Wall-clock median and p95, and the median CPU time, which other work on a shared machine disturbs far less. */
async function time(
  fn: () => unknown,
  runs: number,
  warmup: number,
): Promise<{ medianMs: number; p95Ms: number; cpuMedianMs: number }> {
  for (let i = 0; i < warmup; i++) await fn();
  const samples: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    const c = cpuMs();
    await fn();
    cpu.push(cpuMs() - c);
    samples.push(performance.now() - t);
  }
  samples.sort((a, b) => a - b);
  cpu.sort((a, b) => a - b);
  const at = (xs: number[], q: number) => xs[Math.min(xs.length - 1, Math.ceil(q * xs.length) - 1)];
  return { medianMs: at(samples, 0.5), p95Ms: at(samples, 0.95), cpuMedianMs: at(cpu, 0.5) };
}

const drainage: RuleProfile = { ...commonRuralTemplate, minDrainageGradePercent: 1 };
// Three grounds: rolling ground climbing 8% (plain), a 22% bank the design must cut and bend to clear the car
// (clearance work), and level rolling ground under a 1% drainage minimum (drainage rule).
const grounds: [string, number, RuleProfile][] = [
  ['plain', 0.08, commonRuralTemplate],
  ['clearance work', 0.22, commonRuralTemplate],
  ['drainage rule', 0, drainage],
];

// V8 runs the solver's WebAssembly first on its baseline compiler and optimises the busy functions in the
// background, and the check's JavaScript warms up the same way, so a process's first calls run up to several
// times slower than the rest. The design pool's workers live as long as the server, so the ratio compares both
// sides warmed up alike; the first proposal in a fresh process is printed beside it. Two things kept the first
// ground's row from being warm: ten calls were not enough (at 200 stations a proposal's CPU time measured still
// about twice its settled value over calls 12-20, settling after about 30), and the check was timed while the
// first proposal's code was still being compiled on background threads, whose CPU time process.cpuUsage counts.
// So every ground of a size is warmed, both sides in turn, before any is timed.
const WARMUP = { 200: 30, 2000: 3 } as const;

async function main() {
  for (const [stations, spacing, target, runs] of [
    [200, 2, 20, 9],
    [2000, 1, 100, 3],
  ] as const) {
    const sized = grounds.map(([name, climb, rules]) => ({
      name,
      rules,
      ground: rollingGround(stations, spacing, climb),
      firstMs: 0,
    }));
    for (const g of sized) {
      const started = performance.now();
      const first = await proposeProfile({ existing: g.ground, roadEdgeElevationFt: 100 }, g.rules);
      g.firstMs = performance.now() - started;
      if (!first.feasible) throw new Error(`benchmark ground "${g.name}" should be feasible: ${first.reason}`);
    }
    for (let i = 0; i < WARMUP[stations]; i++) {
      for (const { ground, rules } of sized) {
        await proposeProfile({ existing: ground, roadEdgeElevationFt: 100 }, rules);
        checkEntrance({ profile: ground, scrapeStepFt: 0.1 }, rules);
      }
    }
    for (const { name, ground, rules, firstMs } of sized) {
      const check = await time(() => checkEntrance({ profile: ground, scrapeStepFt: 0.1 }, rules), 21, 3);
      const propose = await time(() => proposeProfile({ existing: ground, roadEdgeElevationFt: 100 }, rules), runs, 1);
      const ratio = propose.medianMs / check.medianMs;
      const cpuRatio = propose.cpuMedianMs / check.cpuMedianMs;
      console.log(
        `${stations} stations, ${name}: checkEntrance median ${check.medianMs.toFixed(1)} ms; proposeProfile median ` +
          `${propose.medianMs.toFixed(0)} ms, p95 ${propose.p95Ms.toFixed(0)} ms (first on this ground ${firstMs.toFixed(0)} ms); ` +
          `ratio ${ratio.toFixed(1)}x, by CPU time ${cpuRatio.toFixed(1)}x (target ${target}x: ${Math.max(ratio, cpuRatio) <= target ? 'within' : 'OVER'})`,
      );
    }
  }
}

await main();
