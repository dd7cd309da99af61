import { describe, expect, it } from 'vitest';
import { checkEntrance } from '@shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

// 12 in of cover over the pipe: local codes (docs/sources.md, "Culvert minimums in local codes"). The crown is the
// top of the pipe wall: invert + inside diameter + one wall thickness (geometry of a pipe section).
describe('cover over the culvert counts one wall thickness above the inside diameter', () => {
  const rules = ruleProfile({ culvert: { minCoverIn: 12, lengthIncrementFt: 2 } });
  const cover = (wallThicknessIn: number, surfaceElevationFt: number) => {
    const culvert = {
      diameterIn: 18,
      manningN: 0.012,
      inletInvertFt: 95.5,
      outletInvertFt: 95.2,
      surfaceElevationFt,
      wallThicknessIn,
      lengthFt: 30,
    };
    return findingOf(
      checkEntrance(
        {
          profile: profileFromRuns([
            [20, 2],
            [40, 6],
          ]),
          culvert,
        },
        rules,
      ).findings,
      'culvert.min-cover',
    );
  };

  it('an 18 in pipe with a 2 in wall, invert 95.5, under a 98.0 surface has 10 in of cover', () => {
    // Crown 95.5 + (18 + 2) / 12 = 97.1667 ft; 98 - 97.1667 = 0.8333 ft = 10 in.
    expect(cover(2, 98).measured).toBeCloseTo(10, 9);
  });

  it('raising the surface by exactly the missing 2 in meets the 12 in minimum', () => {
    const f = cover(2, 98 + 2 / 12);
    expect(f.status).toBe('pass');
    expect(f.measured).toBeCloseTo(12, 9);
  });
});
