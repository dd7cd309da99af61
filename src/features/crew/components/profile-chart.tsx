import type { ProfilePoint } from '@shared/engine';
import { station } from './format';

interface Props { design: ProfilePoint[]; existing: ProfilePoint[] | null; landingLengthFt: number | null; roadEdgeFt?: number }

const W = 640;
const H = 220;
const PAD = { left: 52, right: 12, top: 12, bottom: 34 };

/**
 * The design profile against the ground, drawn to scale in SVG so it prints as sharp lines. The vertical scale
 * is exaggerated to fit; the grid labels carry the real numbers.
 */
export function ProfileChart({ design, existing, landingLengthFt, roadEdgeFt = design[0]?.stationFt ?? 0 }: Props) {
  const all = [...design, ...(existing ?? [])];
  if (all.length < 2) return null;
  const [x0, x1] = [Math.min(...all.map((p) => p.stationFt)), Math.max(...all.map((p) => p.stationFt))];
  const [lo, hi] = [Math.min(...all.map((p) => p.elevationFt)), Math.max(...all.map((p) => p.elevationFt))];
  const span = Math.max(hi - lo, 1);
  const [y0, y1] = [lo - span * 0.1, hi + span * 0.1];
  const sx = (s: number) => PAD.left + ((s - x0) / Math.max(x1 - x0, 1)) * (W - PAD.left - PAD.right);
  const sy = (e: number) => H - PAD.bottom - ((e - y0) / (y1 - y0)) * (H - PAD.top - PAD.bottom);
  const line = (pts: ProfilePoint[]) => pts.map((p) => `${sx(p.stationFt).toFixed(1)},${sy(p.elevationFt).toFixed(1)}`).join(' ');
  const ticks = [y0, (y0 + y1) / 2, y1];
  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Design profile along the centreline, with the ground as surveyed" className="h-auto w-full print:h-[1.4in]">
        {landingLengthFt !== null && (
          <rect x={sx(roadEdgeFt)} y={PAD.top} width={Math.max(0, sx(roadEdgeFt + landingLengthFt) - sx(roadEdgeFt))} height={H - PAD.top - PAD.bottom} fill="#f2b33d" opacity="0.25" />
        )}
        {ticks.map((t) => (
          <g key={t}>
            <line x1={PAD.left} x2={W - PAD.right} y1={sy(t)} y2={sy(t)} stroke="#d6d3d1" />
            <text x={PAD.left - 6} y={sy(t) + 4} textAnchor="end" fontSize="12" fill="#1c1f1d">{t.toFixed(1)}</text>
          </g>
        ))}
        {existing && <polyline points={line(existing)} fill="none" stroke="#78716c" strokeWidth="2" strokeDasharray="6 4" />}
        <polyline points={line(design)} fill="none" stroke="#153a2c" strokeWidth="3" />
        {design.map((p) => (
          <g key={p.stationFt}>
            <circle cx={sx(p.stationFt)} cy={sy(p.elevationFt)} r="3.5" fill="#153a2c" />
            <text x={sx(p.stationFt)} y={H - PAD.bottom + 16} textAnchor="middle" fontSize="12" fill="#1c1f1d">{station(p.stationFt)}</text>
          </g>
        ))}
      </svg>
      <figcaption className="text-sm print:text-[7pt]">
        Solid: design grade. {existing ? 'Dashed: ground as surveyed. ' : ''}{landingLengthFt !== null ? 'Shaded: the landing. ' : ''}Elevations in feet; stations below.
      </figcaption>
    </figure>
  );
}
