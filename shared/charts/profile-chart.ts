import { formatStation } from '../engine/station';
import { type ChartPoint, cutFillBands, lineAt, niceStep, ticks } from './chart-geometry';

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
  const parts: string[] = [
    `<defs><clipPath id="plot-area"><rect x="${pad.left}" y="${pad.top}" width="${width - pad.left - pad.right}" height="${height - pad.top - pad.bottom}"/></clipPath></defs>`,
  ];

  const landingEnd = input.roadEdgeStationFt + input.landing.lengthFt;
  parts.push(
    `<rect x="${n(x(input.roadEdgeStationFt))}" y="${pad.top}" width="${n(Math.max(0, x(Math.min(landingEnd, maxS)) - x(input.roadEdgeStationFt)))}" height="${height - pad.top - pad.bottom}" fill="${chartColors.landing}"/>`,
  );
  parts.push(text(x(input.roadEdgeStationFt) + 4, pad.top + 12, `Landing ${input.landing.lengthFt} ft`));

  const sStep = niceStep(maxS - minS, 8);
  for (const s of ticks(minS, maxS + 1e-9, sStep)) {
    parts.push(
      `<line x1="${n(x(s))}" y1="${pad.top}" x2="${n(x(s))}" y2="${height - pad.bottom}" stroke="${chartColors.grid}" stroke-width="0.5"/>`,
    );
    parts.push(text(x(s), height - pad.bottom + 14, formatStation(s), 'text-anchor="middle"'));
  }
  const eStep = niceStep(maxE - minE, 5);
  for (const e of ticks(minE, maxE, eStep)) {
    parts.push(
      `<line x1="${pad.left}" y1="${n(y(e))}" x2="${width - pad.right}" y2="${n(y(e))}" stroke="${chartColors.grid}" stroke-width="0.5"/>`,
    );
    parts.push(text(pad.left - 6, y(e) + 3, n(e), 'text-anchor="end"'));
  }
  parts.push(text(pad.left, height - 8, 'Station (ft from the road edge)'));
  parts.push(text(12, pad.top - 10, 'Elevation (ft)'));

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
  main.forEach((a, i) => {
    const b = main[i + 1];
    if (!b) return;
    const grade = ((b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt)) * 100;
    const fails = failing.has(Math.round(a.stationFt * 1000));
    if (fails)
      parts.push(
        `<path d="${path([a, b])}" fill="none" stroke="${chartColors.fail}" stroke-width="4" data-failing="${esc(formatStation(a.stationFt))}"/>`,
      );
    if (x(b.stationFt) - x(a.stationFt) > 26) {
      const mx = (x(a.stationFt) + x(b.stationFt)) / 2;
      const my = (y(a.elevationFt) + y(b.elevationFt)) / 2 - 7;
      parts.push(
        text(
          mx,
          my,
          `${grade.toFixed(1)}%`,
          `text-anchor="middle" font-weight="${fails ? 'bold' : 'normal'}"`,
          fails ? chartColors.fail : chartColors.text,
        ),
      );
    }
  });

  for (const p of input.scrapePoints) {
    const px = x(p.stationFt);
    const py = y(lineAt(main, p.stationFt));
    parts.push(
      `<path d="M${n(px)} ${n(py + 3)} L${n(px - 6)} ${n(py + 14)} L${n(px + 6)} ${n(py + 14)} Z" fill="${chartColors.fail}"/>`,
    );
    parts.push(text(px, py + 26, p.label, 'text-anchor="middle"'));
  }

  parts.push(legend(width - pad.right - 250, 10, Boolean(input.design), text));
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
