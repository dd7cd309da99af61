import { describe, expect, it } from 'vitest';
import { earthMoved } from '@shared/engine/design-measures';
import { DesignProgram, type ProgramSpec } from '@shared/engine/design-program';
import { designSolver } from '@shared/engine/design-solver';
import { segmentRanges } from '@shared/engine/least-earth-model';
import { commonRuralTemplate } from '@shared/engine/rule-profile';

// Solver bookkeeping (no published source needed): a programme started from a nearby design is the same
// programme, so every crest and clearance share tried on it gives the design moving the same earth as one
// started from nothing. Ground invented for the test.
// Level for 30 ft, then a 25% bank, so the design has to bend hard and the clearance rows bind.
const ground = Array.from({ length: 40 }, (_, i) => ({
  stationFt: i * 2,
  elevationFt: 100 + 0.25 * Math.max(0, i * 2 - 30) + 0.3 * Math.sin(i / 1.7),
}));
const vertices = ground.map((_, i) => i).filter((i) => i % 3 === 0 || i === ground.length - 1);
const corners = vertices.map((i) => ground[i]);
const spec: ProgramSpec = {
  ground,
  vertices,
  ranges: segmentRanges(corners, commonRuralTemplate),
  rules: commonRuralTemplate,
  roadEdgeFt: 100,
  targetEndFt: undefined,
  margin: 1e-6,
};
// Earth compared to a millionth of the square feet moved: the solver meets its rows to about 1e-9 ft.
const TOLERANCE = 1e-6;

describe('a design programme started from a nearby design', () => {
  it('finds designs moving the same earth as one started from nothing, through bound changes', async () => {
    const highs = await designSolver();
    const cold = new DesignProgram(highs, spec);
    // A start off the answer everywhere, and not straight, so every row's activity there is its own.
    const at = Float64Array.from(corners, (c) => c.elevationFt + 0.4 * Math.cos(c.stationFt));
    const warm = new DesignProgram(highs, { ...spec, near: { at, k: vertices.length - 1 } });
    try {
      const rising = vertices.length - 1;
      const earth: number[] = [];
      for (const share of [1, 0.6, 0.3].map((s) => new Float64Array(vertices.length).fill(s))) {
        const a = cold.solve(share, rising);
        const b = warm.solve(share, rising);
        if (a.status !== 'optimal' || b.status !== 'optimal') throw new Error(`not solved: ${a.status}, ${b.status}`);
        const designB = warm.built.read(b.x);
        expect(designB[0].elevationFt).toBeCloseTo(100, 9);
        earth.push(earthMoved(ground, cold.built.read(a.x)));
        expect(Math.abs(earthMoved(ground, designB) - earth[earth.length - 1])).toBeLessThanOrEqual(TOLERANCE);
      }
      // The clearance binds: each tighter share costs earth, so the shifted row bounds are exercised.
      expect(earth[1]).toBeGreaterThan(earth[0] + TOLERANCE);
      expect(earth[2]).toBeGreaterThan(earth[1] + TOLERANCE);
    } finally {
      cold.dispose();
      warm.dispose();
    }
  });
});
