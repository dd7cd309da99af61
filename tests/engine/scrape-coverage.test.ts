import { describe, expect, it } from 'vitest';
import { checkEntrance, commonRuralTemplate, scrapeCheck } from '@shared/engine';
import { profileFromRuns } from './fixtures';

// Passenger car 11 ft wheelbase, 3 ft and 5 ft overhangs (docs/sources.md, "Grades and vehicles": from memory). To
// cross a break fully the car must get its whole length past it, one way or the other: geometry, no source needed.
const vehicle = { name: 'Passenger car', wheelbaseFt: 11, frontOverhangFt: 3, rearOverhangFt: 5, clearanceIn: 5 };

describe('a survey that ends before the car has crossed the last break says the scrape check was partial', () => {
  it('10 ft past a break is short of the 16 ft the car needs: an advisory finding at the break, not a silent pass', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 2],
          [10, 12],
        ]),
      },
      commonRuralTemplate,
    );
    const coverage = r.findings.find((f) => f.ruleId === 'scrape.coverage');
    expect(coverage).toMatchObject({ status: 'advisory', stationFt: 20, unit: 'ft', limit: 16 });
    expect(coverage?.measured).toBeCloseTo(10, 9);
    expect(coverage?.margin).toBeCloseTo(-6, 9);
    expect(coverage?.label).toBe('Scrape check past the last grade break');
    expect(coverage?.note).toMatch(/checked only in part/);
    expect(r.summary.text).toContain('1 item needs a closer look');
  });

  it('a survey that runs the whole car length past its last break has no coverage finding', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 2],
          [16, 12],
        ]),
      },
      commonRuralTemplate,
    );
    expect(r.findings.some((f) => f.ruleId === 'scrape.coverage')).toBe(false);
  });

  it('the scrape result itself names the break and the distances', () => {
    const r = scrapeCheck({
      profile: profileFromRuns([
        [20, 2],
        [10, 12],
      ]),
      vehicle,
    });
    expect(r.partialCoverage).toMatchObject({ breakStationFt: 20, neededFt: 16 });
    expect(r.partialCoverage?.surveyedPastFt).toBeCloseTo(10, 9);
  });
});
