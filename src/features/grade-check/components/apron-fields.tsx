import { type FieldErrors, withLabel } from '../lib/read-number';
import type { SurveyState } from '../lib/survey-state';
import { NumberBox } from './number-box';

type Apron = SurveyState['apron'];

const CROSS = 'Driveway cross slope (%)';
const WARP = 'Warp length (ft)';
const EVERY = 'Warp stake every (ft)';

/** The warped apron: both edges of the entrance from the road's grade to the driveway's cross slope. */
export function ApronFields({
  apron,
  errors,
  onChange,
}: {
  apron: Apron;
  errors: FieldErrors;
  onChange: (patch: Partial<Apron>) => void;
}) {
  const e = (key: string, label: string) => withLabel(label, errors[`apron.${key}`]);
  return (
    <div className="space-y-4">
      <label className="flex items-center gap-2 text-sm font-semibold">
        <input type="checkbox" checked={apron.checked} onChange={(ev) => onChange({ checked: ev.target.checked })} />
        Check both edges of the entrance and give the crew warp stakes
      </label>
      {apron.checked && (
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          <NumberBox
            label={CROSS}
            hint="Once the warp is done; facing into the property, + rises to the right"
            value={apron.drivewayCrossSlopePercent}
            error={e('drivewayCrossSlopePercent', CROSS)}
            onChange={(drivewayCrossSlopePercent) => onChange({ drivewayCrossSlopePercent })}
          />
          <NumberBox
            label={WARP}
            hint="Blank: the rule profile's, else the landing length"
            value={apron.warpLengthFt}
            error={e('warpLengthFt', WARP)}
            onChange={(warpLengthFt) => onChange({ warpLengthFt })}
          />
          <NumberBox
            label={EVERY}
            value={apron.stakeIntervalFt}
            error={e('stakeIntervalFt', EVERY)}
            onChange={(stakeIntervalFt) => onChange({ stakeIntervalFt })}
          />
        </div>
      )}
    </div>
  );
}
