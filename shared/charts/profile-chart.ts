import { formatStation } from '../engine/station';
import { type ChartPoint, cutFillBands, lineAt, niceStep, ticks } from './chart-geometry';
import { LabelPlacer, type Anchor } from './label-layout';

export interface ProfileChartInput {
  /** The ground as surveyed. */
  ground: readonly ChartPoint[];
  /** The profile being built to (a proposal or the checked design); absent when only the ground is known. */
  design?: readonly ChartPoint[];
  roadEdgeStationFt: number;
  landing: { lengthFt: number; minGradePercent: number; maxGradePercent: number };
  maxGradePercent: number;
  /** Which line the findings below were checked on: grade labels, failing segments and scrape marks go on it. */
  checked: 'ground' | 'design';
  /** Stations where a finding failed; the segment starting there is drawn in clay. */
  failingStationsFt: readonly number[];
  scrapePoints: readonly { stationFt: number; label: string }[];
  width?: number;
  height?: number;
  fontFamily?: string;
}

export const chartColors = {
  ground: '#7a5c3e',
  design: '#1d4a38',
  fail: '#9c4a2f',
  cut: '#f2b33d',
  fill: '#3f7a5e',
  landing: '#f1f6f2',
  grid: '#d6d3cd',
  limit: '#b7791f',
  text: '#1c1f1d',
};

const esc = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const n = (v: number) => (Math.round(v * 10) / 10).toString();

/**
 * The profile picture for the live check and the PDF report alike: one function, one SVG string. Elevations are
 * exaggerated to fill the height, as profile sheets are, so grade labels carry the true numbers.
 */
export function profileChartSvg(input: ProfileChartInput): string {
  const width = input.width ?? 760;
  const height = input.height ?? 340;
  const font = input.fontFamily ?? 'sans-serif';
  const pad = { left: 56, right: 16, top: 28, bottom: 48 };
  const main = input.checked === 'design' && input.design ? input.design : input.ground;
  const all = [...input.ground, ...(input.design ?? [])];
  const minS = Math.min(...all.map((p) => p.stationFt), input.roadEdgeStationFt);
  const maxS = Math.max(...all.map((p) => p.stationFt));
  const rawMinE = Math.min(...all.map((p) => p.elevationFt));
  const rawMaxE = Math.max(...all.map((p) => p.elevationFt));
  const spanE = Math.max(rawMaxE - rawMinE, 1);
  const minE = rawMinE - spanE * 0.12;
  const maxE = rawMaxE + spanE * 0.18;
  const x = (s: number) => pad.left + ((s - minS) / Math.max(maxS - minS, 1e-6)) * (width - pad.left - pad.right);
  const y = (e: number) => pad.top + ((maxE - e) / (maxE - minE)) * (height - pad.top - pad.bottom);
  const path = (pts: readonly ChartPoint[]) =>
    pts.map((p, i) => `${i ? 'L' : 'M'}${n(x(p.stationFt))} ${n(y(p.elevationFt))}`).join(' ');
  const text = (tx: number, ty: number, body: string, extra = '', fill = chartColors.text) =>
    `<text x="${n(tx)}" y="${n(ty)}" font-family="${esc(font)}" font-size="10" fill="${fill}" ${extra}>${esc(body)}</text>`;
  // Every text takes its room on the chart; labels that find none are left out rather than drawn over another.
  const placer = new LabelPlacer({ x: 0, y: 0, width, height }, 10);
  const fixed = (tx: number, ty: number, body: string, anchor: Anchor = 'start') => {
    placer.reserve(placer.boxFor(body, { x: tx, y: ty, anchor }));
    return text(tx, ty, body, anchor === 'start' ? '' : `text-anchor="${anchor}"`);
  };
  const parts: string[] = [
    `<defs><clipPath id="plot-area"><rect x="${pad.left}" y="${pad.top}" width="${width - pad.left - pad.right}" height="${height - pad.top - pad.bottom}"/></clipPath></defs>`,
  ];

  const landingEnd = input.roadEdgeStationFt + input.landing.lengthFt;
  parts.push(
    `<rect x="${n(x(input.roadEdgeStationFt))}" y="${pad.top}" width="${n(Math.max(0, x(Math.min(landingEnd, maxS)) - x(input.roadEdgeStationFt)))}" height="${height - pad.top - pad.bottom}" fill="${chartColors.landing}"/>`,
  );
  const labels: string[] = [];
  const label = (
    body: string,
    spots: { x: number; y: number; anchor: Anchor }[],
    shifts: number,
    bold = false,
    fill?: string,
  ) => {
    const placed = placer.place(body, spots, { shifts, bold, fill });
    if (placed)
      labels.push(text(placed.textX, placed.textY, body, bold ? 'font-weight="bold"' : '', fill ?? chartColors.text));
  };

  const sStep = niceStep(maxS - minS, 8);
  for (const s of ticks(minS, maxS + 1e-9, sStep)) {
    parts.push(
      `<line x1="${n(x(s))}" y1="${pad.top}" x2="${n(x(s))}" y2="${height - pad.bottom}" stroke="${chartColors.grid}" stroke-width="0.5"/>`,
    );
    parts.push(fixed(x(s), height - pad.bottom + 14, formatStation(s), 'middle'));
  }
  const eStep = niceStep(maxE - minE, 5);
  for (const e of ticks(minE, maxE, eStep)) {
    parts.push(
      `<line x1="${pad.left}" y1="${n(y(e))}" x2="${width - pad.right}" y2="${n(y(e))}" stroke="${chartColors.grid}" stroke-width="0.5"/>`,
    );
    parts.push(fixed(pad.left - 6, y(e) + 3, n(e), 'end'));
  }
  parts.push(fixed(pad.left, height - 8, 'Station (ft from the road edge)'));
  parts.push(fixed(12, pad.top - 10, 'Elevation (ft)'));
  parts.push(legend(width - pad.right - 250, 10, Boolean(input.design), fixed));
  // The legend's swatches too, not only its words.
  placer.reserve({ x: width - pad.right - 250, y: 10, width: 250, height: 12 });
  label(
    `Landing ${input.landing.lengthFt} ft`,
    [{ x: x(input.roadEdgeStationFt) + 4, y: pad.top + 12, anchor: 'start' }],
    3,
  );

  if (input.design) {
    for (const band of cutFillBands(input.ground, input.design)) {
      parts.push(
        `<path d="${path(band.outline)} Z" fill="${band.kind === 'cut' ? chartColors.cut : chartColors.fill}" fill-opacity="0.35" stroke="none"/>`,
      );
    }
  }

  // The steepest the rules allow, drawn up and down from the road edge: a profile between the lines is in bounds.
  const start = { stationFt: input.roadEdgeStationFt, elevationFt: lineAt(main, input.roadEdgeStationFt) };
  const end = Math.min(landingEnd, maxS);
  for (const g of [input.landing.maxGradePercent, input.landing.minGradePercent]) {
    const atEnd = start.elevationFt + (g / 100) * (end - start.stationFt);
    const tail = g >= 0 ? input.maxGradePercent : -input.maxGradePercent;
    const far = atEnd + (tail / 100) * (maxS - end);
    parts.push(
      `<path d="M${n(x(start.stationFt))} ${n(y(start.elevationFt))} L${n(x(end))} ${n(y(atEnd))} L${n(x(maxS))} ${n(y(far))}" fill="none" stroke="${chartColors.limit}" stroke-width="1" stroke-dasharray="2 3" clip-path="url(#plot-area)"/>`,
    );
  }

  parts.push(
    `<path d="${path(input.ground)}" fill="none" stroke="${chartColors.ground}" stroke-width="1.5" ${input.design ? 'stroke-dasharray="5 3"' : ''}/>`,
  );
  if (input.design)
    parts.push(`<path d="${path(input.design)}" fill="none" stroke="${chartColors.design}" stroke-width="2"/>`);

  const failing = new Set(input.failingStationsFt.map((s) => Math.round(s * 1000)));
  const grades: { body: string; fails: boolean; mx: number; my: number }[] = [];
  main.forEach((a, i) => {
    const b = main[i + 1];
    if (!b) return;
    const grade = ((b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt)) * 100;
    const fails = failing.has(Math.round(a.stationFt * 1000));
    if (fails)
      parts.push(
        `<path d="${path([a, b])}" fill="none" stroke="${chartColors.fail}" stroke-width="4" data-failing="${esc(formatStation(a.stationFt))}"/>`,
      );
    // A failing grade is always offered a label; others where the segment is wide enough to tell them apart.
    if (fails || x(b.stationFt) - x(a.stationFt) > 26) {
      const mx = (x(a.stationFt) + x(b.stationFt)) / 2;
      const my = (y(a.elevationFt) + y(b.elevationFt)) / 2 - 7;
      grades.push({ body: `${grade.toFixed(1)}%`, fails, mx, my });
    }
  });

  for (const p of input.scrapePoints) {
    const px = x(p.stationFt);
    const py = y(lineAt(main, p.stationFt));
    const mark = `M${n(px)} ${n(py + 3)} L${n(px - 6)} ${n(py + 14)} L${n(px + 6)} ${n(py + 14)} Z`;
    parts.push(`<path d="${mark}" fill="${chartColors.fail}"/>`);
    placer.reserve({ x: px - 6, y: py + 3, width: 12, height: 11 });
  }
  // The most telling first: failing grades, then the scrape marks' words, then the other grades where room is left.
  const grade = (g: (typeof grades)[number]) =>
    label(
      g.body,
      [
        { x: g.mx, y: g.my, anchor: 'middle' },
        { x: g.mx, y: g.my + 22, anchor: 'middle' },
      ],
      1,
      g.fails,
      g.fails ? chartColors.fail : chartColors.text,
    );
  grades.filter((g) => g.fails).forEach(grade);
  for (const p of input.scrapePoints) {
    const px = x(p.stationFt);
    const py = y(lineAt(main, p.stationFt));
    label(
      p.label,
      [
        { x: px, y: py + 26, anchor: 'middle' },
        { x: px, y: py - 8, anchor: 'middle' },
        { x: px - 8, y: py + 12, anchor: 'end' },
      ],
      2,
    );
  }
  grades.filter((g) => !g.fails).forEach(grade);
  parts.push(...labels);
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-label="Profile chart">${parts.join('')}</svg>`;
}

function legend(x0: number, y0: number, withDesign: boolean, text: (x: number, y: number, body: string) => string) {
  const items: [string, string][] = [[chartColors.ground, 'Ground']];
  if (withDesign) items.push([chartColors.design, 'Design'], [chartColors.cut, 'Cut'], [chartColors.fill, 'Fill']);
  items.push([chartColors.limit, 'Limits']);
  return items
    .map(
      ([color, label], i) =>
        `<rect x="${x0 + i * 52}" y="${y0}" width="10" height="10" fill="${color}"/>${text(x0 + i * 52 + 13, y0 + 9, label)}`,
    )
    .join('');
}
