import { describe, expect, it } from 'vitest';
import { commonRuralTemplate, type RuleProfile } from '@shared/engine';
import { allowedGradeAt, designAt, designWords } from '../../src/features/jobs/components/reading-checks';

// A designed entrance: a 4% landing for 20 ft, then 13.5% to the end (invented figures, plain arithmetic).
const design = [
  { stationFt: 0, elevationFt: 100 },
  { stationFt: 20, elevationFt: 100.8 },
  { stationFt: 100, elevationFt: 111.6 },
];
const rules: RuleProfile = { ...commonRuralTemplate, maxGradePercent: 15 };

describe('what the as-built screen shows beside each station', () => {
  it('reads the design elevation on the line between vertices and that line’s grade', () => {
    const here = designAt(design, 10)!;
    expect(here.elevationFt).toBeCloseTo(100.4, 9);
    expect(here.gradePercent).toBeCloseTo(4, 9);
  });

  it('at a break takes the grade of the line that starts there, as the crew builds onward from it', () => {
    const here = designAt(design, 20)!;
    expect(here.elevationFt).toBeCloseTo(100.8, 9);
    expect(here.gradePercent).toBeCloseTo(13.5, 9);
    expect(designAt(design, 100)!.gradePercent).toBeCloseTo(13.5, 9);
  });

  it('has no design outside the designed stations, or without a design', () => {
    expect(designAt(design, 100.5)).toBeNull();
    expect(designAt(design, -1)).toBeNull();
    expect(designAt(null, 10)).toBeNull();
  });

  it('says the design in words, and without one the grade the rule profile allows there', () => {
    const basis = { ruleProfile: rules, design, roadEdgeStationFt: 0 };
    expect(designWords(basis, 10)).toBe('Design here: 100.40 ft, grade 4.0%');
    const bare = { ...basis, design: null };
    const landing = rules.landing;
    expect(allowedGradeAt(rules, 0, 5).where).toBe('landing');
    expect(designWords(bare, 5)).toBe(
      `No design here; the landing allows ${landing.minGradePercent < 0 ? '−' : ''}${Math.abs(landing.minGradePercent).toFixed(1)}% to ${landing.maxGradePercent.toFixed(1)}%`,
    );
    expect(designWords(bare, 40)).toBe('No design here; the driveway allows at most 15.0%');
    // The landing is measured from the road edge, not from station 0+00.
    expect(allowedGradeAt(rules, 10, 25).where).toBe('landing');
  });
});
