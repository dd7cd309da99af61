import { Button } from '@/components/ui/button';
import type { FieldErrors } from '../lib/read-number';
import { newKey, type StakeRow, type SurveyState } from '../lib/survey-state';
import { NumberBox } from './number-box';

type Laser = SurveyState['laser'];
const cell = 'w-full rounded border border-stone-300 px-2 py-1 font-mono text-sm aria-[invalid=true]:border-clay';

export function StakesEditor({
  laser,
  errors,
  onChange,
}: {
  laser: Laser;
  errors: FieldErrors;
  onChange: (patch: Partial<Laser>) => void;
}) {
  const edit = (i: number, patch: Partial<StakeRow>) =>
    onChange({ stakes: laser.stakes.map((s, j) => (j === i ? { ...s, ...patch } : s)) });
  const columns = [
    ['label', 'Stake'],
    ['offsetFt', 'Offset right of CL (ft)'],
    ['distanceFt', 'From the road edge (ft)'],
    ['rodReadingFt', 'Rod reading (ft)'],
  ] as const;
  return (
    <div className="space-y-3">
      <div className="max-w-xs">
        <NumberBox
          label="Receiver on-grade rod reading (ft)"
          hint="The beam's height above design grade"
          value={laser.receiverOffsetFt}
          error={errors['laser.receiverOffsetFt']}
          onChange={(receiverOffsetFt) => onChange({ receiverOffsetFt })}
        />
      </div>
      {laser.stakes.length > 0 && (
        <table className="w-full text-sm">
          <thead>
            <tr className="text-left text-stone-600">
              {columns.map(([, title]) => (
                <th key={title}>{title}</th>
              ))}
              <th>
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {laser.stakes.map((stake, i) => (
              <tr key={stake.key}>
                {columns.map(([key, title]) => {
                  const error = errors[`laser.stakes.${i}.${key}`];
                  return (
                    <td key={key} className="py-1 pr-2">
                      <input
                        aria-label={`${title}, stake ${i + 1}`}
                        className={cell}
                        value={stake[key]}
                        aria-invalid={Boolean(error)}
                        onChange={(e) => edit(i, { [key]: e.target.value })}
                      />
                      {error && <p className="text-xs text-clay">{error}</p>}
                    </td>
                  );
                })}
                <td>
                  <Button variant="quiet" onClick={() => onChange({ stakes: laser.stakes.filter((_, j) => j !== i) })}>
                    Remove
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <Button
        variant="secondary"
        onClick={() =>
          onChange({
            stakes: [...laser.stakes, { key: newKey(), label: '', offsetFt: '0', distanceFt: '', rodReadingFt: '' }],
          })
        }
      >
        Add a stake
      </Button>
    </div>
  );
}
