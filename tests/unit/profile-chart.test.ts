import { describe, expect, it } from 'vitest';
import { ticks } from '@shared/charts/chart-geometry';
import { haulEstimate, loadsText } from '@shared/charts/cut-fill-table';
import { overlaps, textWidth } from '@shared/charts/label-layout';
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

/** Every text on the chart as the box the label placer measures it by. */
function textBoxes(svg: string) {
  return [...svg.matchAll(/<text x="([-\d.]+)" y="([-\d.]+)"([^>]*)>([^<]*)<\/text>/g)].map(
    ([, x, y, attributes, body]) => {
      const anchor = /text-anchor="(\w+)"/.exec(attributes)?.[1];
      const width = textWidth(body, 10);
      const left = anchor === 'middle' ? Number(x) - width / 2 : anchor === 'end' ? Number(x) - width : Number(x);
      return { text: body, x: left, y: Number(y) - 10, width, height: 13 };
    },
  );
}

describe('the profile chart keeps its labels apart', () => {
  // A bumpy driveway surveyed every 4 ft, with scrape marks low on the chart: grade labels of neighbouring segments,
  // scrape labels and the station labels under the plot all compete for room.
  const bumpy = Array.from({ length: 26 }, (_, i) => ({
    stationFt: i * 4,
    elevationFt: 100 + (i % 2 === 0 ? 0 : 0.9) - i * 0.1,
  }));
  const input: ProfileChartInput = {
    ...chart(bumpy, 0),
    failingStationsFt: [8, 12],
    scrapePoints: [
      { stationFt: 96, label: 'Scrape risk' },
      { stationFt: 48, label: 'Scrape risk' },
    ],
  };

  it.each([
    ['at the screen size', {}],
    ['at a narrow size', { width: 480, height: 260 }],
  ])('%s: no two texts overlap, and each failing grade keeps its label', (_name, size) => {
    const svg = profileChartSvg({ ...input, ...size });
    const boxes = textBoxes(svg);
    expect(boxes.length).toBeGreaterThan(10);
    for (let i = 0; i < boxes.length; i += 1)
      for (let j = i + 1; j < boxes.length; j += 1)
        expect(overlaps(boxes[i], boxes[j]), `"${boxes[i].text}" overlaps "${boxes[j].text}"`).toBe(false);
    expect(svg.match(/font-weight="bold"/g)?.length).toBe(2);
    expect(svg).toContain('Scrape risk');
  });
});
