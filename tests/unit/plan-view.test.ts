import { describe, expect, it } from 'vitest';
import { overlaps } from '@shared/charts/label-layout';
import { planViewLayout, planViewSvg, scaleBarFeet, type PlanViewInput } from '@shared/charts/plan-view';
import { planInputFor } from '@shared/charts/plan-input';

/** The demo's kind of entrance: every part of the plan known. */
const full: PlanViewInput = {
  roadName: 'Tamarack Line',
  roadGradePercent: 2.5,
  roadWidthFt: 22,
  rightOfWayFt: 17,
  bearingDeg: 35,
  drivewayLengthFt: 80,
  widthFt: 14,
  flareRadiusFt: 10,
  culvert: {
    diameterIn: 18,
    material: 'concrete',
    lengthFt: 40,
    offsetFt: 8,
    offsetAssumed: false,
    inletSide: 'right',
    inletSideAssumed: false,
    inletInvertFt: 97.3,
    outletInvertFt: 97.0,
  },
  sight: { left: { measuredFt: 520, requiredFt: 445 }, right: { measuredFt: 390, requiredFt: 445 } },
  intersection: { distanceFt: 380, side: 'left', name: 'Orchard Rd' },
  propertyLine: { distanceFt: 15, side: 'right' },
};

const cases: [string, PlanViewInput][] = [
  ['every part known', full],
  ['only the survey', { drivewayLengthFt: 60 }],
  ['a very short survey', { ...full, drivewayLengthFt: 0.5 }],
  ['a long driveway, cut at 150 ft', { ...full, drivewayLengthFt: 900 }],
  [
    'a wide entrance with long flares',
    { ...full, widthFt: 60, flareRadiusFt: 50, culvert: { ...full.culvert!, lengthFt: 200 } },
  ],
  [
    'an intersection and a property line inside the drawing',
    { ...full, intersection: { distanceFt: 40, side: 'right' }, propertyLine: { distanceFt: 5, side: 'left' } },
  ],
  ['a deep right-of-way and a falling road', { ...full, rightOfWayFt: 120, roadGradePercent: -6 }],
  [
    'right turns only, nothing measured',
    { ...full, sight: { left: { requiredFt: 195 }, right: { requiredFt: null } } },
  ],
  ['a small drawing, as on a phone', { ...full, width: 360, height: 300 }],
  ['the packet at A4 width in points', { ...full, width: 499, height: 380 }],
];

describe('the plan view lays its labels out without overlaps', () => {
  it.each(cases)('%s: no two labels overlap and every label stays on the drawing', (_name, input) => {
    const layout = planViewLayout(input);
    for (let i = 0; i < layout.labels.length; i++)
      for (let j = i + 1; j < layout.labels.length; j++)
        expect(
          overlaps(layout.labels[i], layout.labels[j]),
          `"${layout.labels[i].text}" overlaps "${layout.labels[j].text}"`,
        ).toBe(false);
    for (const label of layout.labels) {
      expect(label.x).toBeGreaterThanOrEqual(0);
      expect(label.x + label.width).toBeLessThanOrEqual(layout.width + 1e-9);
      expect(label.y + label.height).toBeLessThanOrEqual(layout.height + 1e-9);
      if (layout.north) expect(overlaps(label, layout.north.box), label.text).toBe(false);
      expect(overlaps(label, layout.scaleBar.box), label.text).toBe(false);
    }
  });

  it('names every part it was given, on the drawing or in the notes under it', () => {
    const texts = planViewLayout(full).labels.map((l) => l.text);
    for (const expected of [
      'Edge of Tamarack Line',
      'Looking left: 520 ft measured, 445 ft required',
      'Looking right: 390 ft measured, 445 ft required',
      'Road rises 2.5% this way',
      'Width 14 ft',
      'Flare radius 10 ft',
      'Driveway centreline',
      'Culvert 18 in concrete, 40 ft',
      'Inlet, invert 97.30 ft',
      'Outlet, invert 97.00 ft',
      'Right-of-way line, 17 ft from road edge',
      'Property line, 15 ft from the entrance',
      'Nearest intersection (Orchard Rd), 380 ft',
    ])
      expect(
        texts.some((t) => t.startsWith(expected)),
        expected,
      ).toBe(true);
  });

  it('says what it does not show when the inputs lack it', () => {
    const { notes } = planViewLayout({ drivewayLengthFt: 60 });
    expect(notes).toContain('Right-of-way line not shown: its distance from the road edge was not given.');
    expect(notes).toContain('Bearing not given: no north arrow.');
    expect(notes).toContain('Entrance width not given: only the centreline is drawn.');
    expect(planViewLayout(full).notes).toEqual([]);
  });
});

describe('the north arrow is drawn only with a bearing', () => {
  it('has none without a bearing', () => {
    const { bearingDeg: _b, ...noBearing } = full;
    expect(planViewLayout(noBearing).north).toBeNull();
    expect(planViewSvg(noBearing)).not.toContain('data-role="north"');
  });

  it('points up the page when the driveway runs north, and left when it runs east', () => {
    const up = planViewLayout({ ...full, bearingDeg: 0 }).north!;
    expect(up.dx).toBeCloseTo(0, 9);
    expect(up.dy).toBeCloseTo(-1, 9);
    // Facing east into the property, north is on the left hand.
    const east = planViewLayout({ ...full, bearingDeg: 90 }).north!;
    expect(east.dx).toBeCloseTo(-1, 9);
    expect(east.dy).toBeCloseTo(0, 9);
    expect(planViewSvg({ ...full, bearingDeg: 90 })).toContain('data-role="north"');
  });
});

describe('the scale bar', () => {
  it('is a round length that measures true at the drawing scale', () => {
    const layout = planViewLayout(full);
    expect([5, 10, 20, 25, 50, 100, 200, 250, 500]).toContain(layout.scaleBar.feet);
    expect(layout.scaleBar.length).toBeCloseTo(layout.scaleBar.feet * layout.scale, 9);
    expect(layout.scaleBar.length).toBeLessThanOrEqual(layout.width / 5);
    expect(planViewSvg(full)).toContain(`>${layout.scaleBar.feet} ft</text>`);
  });

  it('takes the longest round length in a fifth of the width', () => {
    // 4 px per foot and 500 px wide: 100 px of room, so 25 ft (100 px), not 50 ft (200 px).
    expect(scaleBarFeet(4, 500)).toBe(25);
    expect(scaleBarFeet(0.1, 500)).toBe(500);
    expect(scaleBarFeet(100, 500)).toBe(5);
  });
});

describe('the plan view from a check’s inputs', () => {
  const report = {
    profile: {
      points: [
        { stationFt: -4, elevationFt: 100.1 },
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 6, elevationFt: 98.9 },
        { stationFt: 20, elevationFt: 100.4 },
        { stationFt: 60, elevationFt: 103 },
      ],
      segments: [],
    },
    culvert: { requiredLengthFt: 32 },
    sight: { basis: 'intersection' as const, speedMph: 40, requiredLeftFt: 445, requiredRightFt: 445 },
  };
  const inputs = {
    roadEdgeStationFt: 0,
    road: { gradePercent: -3 },
    culvert: {
      diameterIn: 15,
      inlet: 'cmp-projecting' as const,
      inletInvertFt: 97.2,
      outletInvertFt: 97,
    },
    sight: { measuredLeftFt: 500 },
    geometry: { widthFt: 12, distanceToIntersectionFt: 300 },
  };

  it('puts the culvert at the ditch’s low shot, takes the worked-out length and tells the inlet from the road grade', () => {
    const plan = planInputFor(inputs, report);
    expect(plan.drivewayLengthFt).toBe(60);
    expect(plan.culvert).toMatchObject({
      offsetFt: 6,
      offsetAssumed: true,
      lengthFt: 32,
      lengthWorkedOut: true,
      inletSide: 'left',
      inletSideAssumed: false,
      material: 'corrugated metal',
    });
    expect(plan.sight).toEqual({
      left: { measuredFt: 500, requiredFt: 445 },
      right: { measuredFt: undefined, requiredFt: 445 },
    });
    expect(plan.intersection).toEqual({ distanceFt: 300, side: undefined, name: undefined });
    expect(planViewLayout(plan).notes).toContain('Nearest intersection 300 ft away; side not given, so not drawn.');
  });

  it('takes the plan part’s own values when they are given', () => {
    const plan = planInputFor(
      { ...inputs, plan: { culvertStationFt: 10, culvertMaterial: 'PVC', intersectionSide: 'right', bearingDeg: 200 } },
      report,
    );
    expect(plan.culvert).toMatchObject({ offsetFt: 10, offsetAssumed: false, material: 'PVC' });
    expect(plan.intersection?.side).toBe('right');
    expect(plan.bearingDeg).toBe(200);
  });
});
