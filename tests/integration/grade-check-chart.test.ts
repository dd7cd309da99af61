import { describe, expect, it } from 'vitest';
import { cutFillBands } from '@shared/charts/chart-geometry';
import { chartInputFor } from '@shared/charts/chart-input';
import { profileChartSvg } from '@shared/charts/profile-chart';
import { checkEntrance, ruleProfileSchema } from '@shared/engine';
import { demoJurisdictions } from '../../server/dev/seed/jurisdictions';
import { groundPoints } from './grade-check-survey';

const marrow = {
  ...ruleProfileSchema.parse(demoJurisdictions[0].profile),
  id: 'v1',
  version: 1,
  jurisdictionName: 'Marrow County',
};
const p = (stationFt: number, elevationFt: number) => ({ stationFt, elevationFt });

describe('the profile chart', () => {
  it('splits cut from fill exactly where the ground crosses the design', () => {
    const ground = [p(0, 100), p(10, 102), p(20, 100)];
    const design = [p(0, 101), p(20, 101)];
    const bands = cutFillBands(ground, design);
    expect(bands.map((b) => b.kind)).toEqual(['fill', 'cut', 'fill']);
    // Ground 100 -> 102 over 10 ft meets 101 at 5 ft; coming back down it meets it at 15 ft.
    expect(bands[0].outline.map((q) => q.stationFt)).toEqual([0, 5, 5, 0]);
    expect(bands[1].outline[0].stationFt).toBe(5);
    expect(bands[1].outline.at(-1)?.stationFt).toBe(5);
    expect(bands[2].outline.slice(0, 2).map((q) => q.stationFt)).toEqual([15, 20]);
    expect(cutFillBands(design, design)).toEqual([]);
  });

  it('marks every segment of a landing steeper than the rules, labels grades and stations the trade way', () => {
    const report = checkEntrance({ profile: groundPoints, roadEdgeStationFt: 0 }, marrow);
    const svg = profileChartSvg(chartInputFor({ roadEdgeStationFt: 0 }, { report }, marrow));
    expect(svg.match(/data-failing="[^"]+"/g)).toEqual(['data-failing="0+00"', 'data-failing="0+10"']);
    expect(svg).toContain('>5.5%<');
    expect(svg).toContain('>12.0%<');
    expect(svg).toContain('>0+40<');
    expect(svg).toContain('Landing 20 ft');
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
  });

  it('escapes what it prints', () => {
    const report = checkEntrance({ profile: groundPoints }, marrow);
    const input = chartInputFor({}, { report }, marrow);
    const svg = profileChartSvg({
      ...input,
      scrapePoints: [{ stationFt: 10, label: '<b>"x" & y</b>' }],
      fontFamily: 'A"B',
    });
    expect(svg).toContain('&lt;b&gt;&quot;x&quot; &amp; y&lt;/b&gt;');
    expect(svg).not.toContain('<b>');
    expect(svg).toContain('font-family="A&quot;B"');
  });
});
