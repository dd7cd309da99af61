import { describe, expect, it } from 'vitest';
import { ticks } from '@shared/charts/chart-geometry';
import { haulEstimate, loadsText } from '@shared/charts/cut-fill-table';
import { profileChartSvg, type ProfileChartInput } from '@shared/charts/profile-chart';

const chart = (ground: ProfileChartInput['ground'], roadEdgeStationFt = ground[0].stationFt): ProfileChartInput => ({
  ground,
  roadEdgeStationFt,
  landing: { lengthFt: 20, minGradePercent: -4, maxGradePercent: 4 },
  maxGradePercent: 15,
  checked: 'ground',
  failingStationsFt: [],
  scrapePoints: [],
});

describe('the profile chart draws any profile the engine accepts, and finishes', () => {
  it('draws a profile only a hair long', () => {
    const svg = profileChartSvg(
      chart([
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 1e-300, elevationFt: 100 },
      ]),
    );
    expect(svg.startsWith('<svg')).toBe(true);
  });

  it('draws a short profile far along the road, where a step is lost in the rounding of the station', () => {
    const svg = profileChartSvg(
      chart([
        { stationFt: 100_000, elevationFt: 100 },
        { stationFt: 100_000 + 1.5e-11, elevationFt: 100 },
      ]),
    );
    expect(svg.match(/<line /g)!.length).toBeLessThan(200);
  });

  it('counts its ticks: at most the number asked for, none for a step that goes nowhere', () => {
    expect(ticks(0, 100, 20)).toEqual([0, 20, 40, 60, 80, 100]);
    expect(ticks(0, 1e9, 1, 50)).toHaveLength(50);
    expect(ticks(100_000, 100_000 + 1e-11, 1e-12)).toEqual([100_000]);
    expect(ticks(0, 10, 0)).toEqual([]);
    expect(ticks(0, 10, Number.NaN)).toEqual([]);
  });
});

describe('the haul estimate beside the cut/fill table', () => {
  const proposal = (cutCuYd: number, fillCuYd: number) =>
    ({ feasible: true, profile: [], cutFillByStation: [], cutCuYd, fillCuYd }) as unknown as Parameters<
      typeof haulEstimate
    >[0];

  it('counts loads for a real job and says so in words', () => {
    const haul = haulEstimate(proposal(34, 0), { soil: 'loam', truckCuYd: 10 });
    expect(haul.cutLoads).toBeGreaterThan(0);
    expect(loadsText(haul.cutLoads, 10)).toMatch(/^\d+ loads of 10 cu yd$/);
    expect(loadsText(haul.fillLoads, 10)).toBe('no truck loads');
  });

  it('does not fail on a volume past the engine’s range (a survey typo); it says to check the survey', () => {
    const haul = haulEstimate(proposal(9.4e8, 9.4e8), { soil: 'loam', truckCuYd: 10 });
    expect(haul.fillLoads).toBeNull();
    expect(loadsText(haul.fillLoads, 10)).toBe('too many truck loads to count: check the survey');
  });
});
