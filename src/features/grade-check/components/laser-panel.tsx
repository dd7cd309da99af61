import { formatStation } from '@shared/engine';
import type { GradeCheckResults } from '@shared/contracts/grade-checks';

type Laser = NonNullable<GradeCheckResults['laser']>;

const setupWords: Record<Laser['stakes'][number]['setup'], string> = {
  first: 'first',
  warp: 'warp (from stakes)',
  second: 'second',
};

/** The two plane settings the crew dials into the dual-slope laser, and each stake's cut or fill. */
export function LaserPanel({ laser }: { laser?: Laser }) {
  if (!laser)
    return (
      <p className="text-sm text-stone-600">The laser settings appear once the centreline and road grade are in.</p>
    );
  const second = laser.secondSetup;
  return (
    <div className="space-y-3 text-sm">
      <div>
        <h4 className="font-semibold text-pine-900">
          First setup: the landing, origin {laser.originElevationFt.toFixed(2)} ft at the road edge
        </h4>
        <p>{laser.description}</p>
        <p className="text-stone-600">
          Steepest slope {laser.steepestPercent.toFixed(2)}% toward {laser.steepestBearingDeg.toFixed(0)}° from the
          centreline.
        </p>
      </div>
      {laser.warp && (
        <div>
          <h4 className="font-semibold text-pine-900">Between the setups: a warp</h4>
          <p>{laser.warp.description}</p>
        </div>
      )}
      <div>
        <h4 className="font-semibold text-pine-900">
          Second setup: the driveway, origin {second.originElevationFt.toFixed(2)} ft at{' '}
          {formatStation(second.originDistanceFt)}
        </h4>
        <p>{second.description}</p>
        <p className="text-stone-600">Steepest slope {second.steepestPercent.toFixed(2)}%.</p>
      </div>
      {laser.stakes.length > 0 && (
        <table className="w-full" aria-label="Stakes">
          <thead>
            <tr className="border-b border-stone-300 text-left text-stone-600">
              <th>Stake</th>
              <th>Setup</th>
              <th className="text-right">Design elevation</th>
              <th className="text-right">Cut / fill</th>
            </tr>
          </thead>
          <tbody>
            {laser.stakes.map((s, i) => (
              <tr key={`${s.label}-${i}`} className="border-b border-stone-100">
                <td>{s.label}</td>
                <td>{setupWords[s.setup]}</td>
                <td className="text-right font-mono">{s.designElevationFt.toFixed(2)} ft</td>
                <td className="text-right font-mono">{s.instruction}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
