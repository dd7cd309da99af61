import type { LaserSheet } from '@shared/crew/crew-views';
import type { PlaneSetting } from '@shared/engine';
import { ft, pct, station } from './format';

const axis = (percent: number, rising: string, falling: string) =>
  Math.abs(percent) < 1e-9 ? 'level' : `${pct(Math.abs(percent))} ${percent > 0 ? rising : falling}`;

function Setup({ title, plane, span }: { title: string; plane: PlaneSetting; span: string }) {
  return (
    <div className="rounded border-2 border-stone-800 p-3 print:p-1.5">
      <h3 className="font-bold">
        {title} <span className="font-normal">({span})</span>
      </h3>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5">
        <dt className="font-semibold">Along the road</dt>
        <dd>
          {axis(plane.alongRoadPercent, 'rising to the right', 'falling to the right')}{' '}
          <span className="text-sm print:text-[7pt]">(facing into the property)</span>
        </dd>
        <dt className="font-semibold">Along the driveway</dt>
        <dd>{axis(plane.alongDrivewayPercent, 'rising away from the road', 'falling away from the road')}</dd>
        <dt className="font-semibold">Steepest</dt>
        <dd>
          {pct(plane.steepestPercent)}, bearing {Math.round(plane.steepestBearingDeg)}°
        </dd>
        <dt className="font-semibold">Start</dt>
        <dd>
          station {station(plane.originDistanceFt)}, design elevation {ft(plane.originElevationFt)}
        </dd>
      </dl>
    </div>
  );
}

/** Both laser setups, the receiver offset and the stake table, in the words the operator uses. */
export function SheetLaser({ laser }: { laser: LaserSheet }) {
  return (
    <div className="space-y-3 print:space-y-1.5">
      <div className="grid gap-3 sm:grid-cols-2 print:grid-cols-2 print:gap-1.5">
        <Setup title="Setup 1: landing" plane={laser.first} span={`road edge to ${station(laser.landingLengthFt)}`} />
        <Setup
          title="Setup 2: driveway"
          plane={laser.second}
          span={`from ${station(laser.second.originDistanceFt)} on`}
        />
      </div>
      {laser.warp && (
        <p>
          <strong>Warp:</strong> {laser.warp.description} No laser plane carries it: build it to the stakes.
        </p>
      )}
      <p>
        <strong>Receiver offset:</strong> on grade reads <strong>{ft(laser.receiverOffsetFt)}</strong> on the rod. A
        shorter reading means cut, a longer one fill.
      </p>
      {laser.stakes.length > 0 && (
        // On a phone each stake is a card of its own (`stack-table`): every column stays on screen.
        <div>
          <table className="stack-table w-full border-collapse text-left">
            <caption className="text-left font-bold">Stakes</caption>
            <thead>
              <tr className="border-b-2 border-stone-800">
                <th className="py-1 pr-2">Stake</th>
                <th className="pr-2">Station</th>
                <th className="pr-2">Offset</th>
                <th className="pr-2">Setup</th>
                <th className="pr-2">Rod</th>
                <th className="pr-2">Design elev.</th>
                <th>Cut / fill</th>
              </tr>
            </thead>
            <tbody>
              {laser.stakes.map((s) => (
                <tr key={`${s.label}-${s.distanceFt}-${s.offsetFt}`} className="border-b border-stone-400">
                  <td data-label="Stake" className="py-1 pr-2 font-semibold">
                    {s.label}
                  </td>
                  <td data-label="Station" className="pr-2">
                    {station(s.distanceFt)}
                  </td>
                  <td data-label="Offset" className="pr-2">
                    {s.offsetFt === 0
                      ? 'centreline'
                      : `${Math.abs(s.offsetFt)} ft ${s.offsetFt < 0 ? 'left' : 'right'}`}
                  </td>
                  <td data-label="Setup" className="pr-2">
                    {s.setup === 'first' ? '1' : s.setup === 'warp' ? 'warp' : '2'}
                  </td>
                  <td data-label="Rod" className="pr-2">
                    {ft(s.rodReadingFt)}
                  </td>
                  <td data-label="Design elev." className="pr-2">
                    {ft(s.designElevationFt)}
                  </td>
                  <td data-label="Cut / fill" className="font-bold">
                    {s.instruction}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
