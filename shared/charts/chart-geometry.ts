export interface ChartPoint {
  stationFt: number;
  elevationFt: number;
}

/** Elevation on the straight lines between points; outside them, the end elevation. */
export function lineAt(points: readonly ChartPoint[], station: number): number {
  if (station <= points[0].stationFt) return points[0].elevationFt;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (station <= b.stationFt)
      return a.elevationFt + ((station - a.stationFt) / (b.stationFt - a.stationFt)) * (b.elevationFt - a.elevationFt);
  }
  return points[points.length - 1].elevationFt;
}

export interface Band {
  kind: 'cut' | 'fill';
  /** Closed outline: along the upper line, then back along the lower one. */
  outline: ChartPoint[];
}

/**
 * Where the ground stands above the design it is cut, below it filled. Both lines are taken at every station of
 * either, and each span is split where they cross, so every band is one kind only.
 */
export function cutFillBands(ground: readonly ChartPoint[], design: readonly ChartPoint[]): Band[] {
  const from = Math.max(ground[0].stationFt, design[0].stationFt);
  const to = Math.min(ground[ground.length - 1].stationFt, design[design.length - 1].stationFt);
  const diff = (s: number) => lineAt(ground, s) - lineAt(design, s);
  const base = [
    ...new Set([from, to, ...[...ground, ...design].map((p) => p.stationFt).filter((s) => s > from && s < to)]),
  ].sort((a, b) => a - b);
  const stations: number[] = [];
  base.forEach((s, i) => {
    const prev = base[i - 1];
    if (prev !== undefined && diff(prev) * diff(s) < 0)
      stations.push(prev + (diff(prev) / (diff(prev) - diff(s))) * (s - prev));
    stations.push(s);
  });
  type Run = { kind: Band['kind']; at: number[] };
  const runs: Run[] = [];
  let run = null as Run | null;
  for (let i = 1; i < stations.length; i++) {
    const a = stations[i - 1];
    const b = stations[i];
    const middle = diff((a + b) / 2);
    if (Math.abs(middle) < 1e-6) {
      run = null;
      continue;
    }
    const kind = middle > 0 ? 'cut' : 'fill';
    if (run?.kind !== kind) {
      run = { kind, at: [a] };
      runs.push(run);
    }
    run.at.push(b);
  }
  return runs.map(({ kind, at }) => {
    const upper = at.map((s) => ({ stationFt: s, elevationFt: Math.max(lineAt(ground, s), lineAt(design, s)) }));
    const lower = at
      .map((s) => ({ stationFt: s, elevationFt: Math.min(lineAt(ground, s), lineAt(design, s)) }))
      .reverse();
    return { kind, outline: [...upper, ...lower] };
  });
}

/**
 * The tick positions from `from` to `to`, counted rather than summed: a span far below a foot, or a step lost in the
 * rounding of large stations, would otherwise never reach the end. At most `most` ticks.
 */
export function ticks(from: number, to: number, step: number, most = 50): number[] {
  if (!(step > 0) || !Number.isFinite(from) || !Number.isFinite(to)) return [];
  const first = Math.ceil(from / step) * step;
  const out: number[] = [];
  for (let i = 0; i < most; i += 1) {
    const at = first + i * step;
    if (at > to || (i > 0 && at === out[i - 1])) break;
    out.push(at);
  }
  return out;
}

/** Round tick spacing so a chart shows about `target` ticks. */
export function niceStep(span: number, target: number): number {
  const raw = span / Math.max(1, target);
  const power = 10 ** Math.floor(Math.log10(raw));
  const [step] = [1, 2, 5, 10].map((m) => m * power).filter((s) => s >= raw);
  return step ?? 10 * power;
}
