import { useState } from 'react';
import { Field, SelectInput } from '@/components/ui/field';
import type { ProfileVersion } from '../api/get-jurisdiction';
import { allFields, profileValueText, sourceKeyOf, valueAt } from '@shared/rule-profiles/profile-fields';
import { ScrollRegion } from '@/components/ui/scroll-region';

const text = (v: unknown) => (v === undefined || v === null || v === '' ? '—' : String(v));

/** Two versions side by side; rows whose value or source changed are marked. */
export function VersionCompare({ versions }: { versions: ProfileVersion[] }) {
  const [leftId, setLeftId] = useState(versions[1]?.id ?? versions[0]?.id ?? '');
  const [rightId, setRightId] = useState(versions[0]?.id ?? '');
  const [onlyChanges, setOnlyChanges] = useState(true);
  const left = versions.find((v) => v.id === leftId);
  const right = versions.find((v) => v.id === rightId);
  const pick = (label: string, value: string, onChange: (id: string) => void) => (
    <Field label={label}>
      {({ id }) => (
        <SelectInput id={id} value={value} onChange={(e) => onChange(e.target.value)}>
          {versions.map((v) => (
            <option key={v.id} value={v.id}>
              Version {v.version} ({v.status === 'draft' ? 'draft' : 'published'})
            </option>
          ))}
        </SelectInput>
      )}
    </Field>
  );
  const rows =
    left && right
      ? allFields.map((f) => {
          const key = sourceKeyOf(f);
          const a = {
            value: valueAt(left.profile, f.path),
            shown: profileValueText(left.profile, f, '—'),
            source: left.profile.sources[key],
          };
          const b = {
            value: valueAt(right.profile, f.path),
            shown: profileValueText(right.profile, f, '—'),
            source: right.profile.sources[key],
          };
          return { f, a, b, changed: text(a.value) !== text(b.value) || text(a.source) !== text(b.source) };
        })
      : [];
  const changed = rows.filter((r) => r.changed).length;
  return (
    <div className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-2">
        {pick('From', leftId, setLeftId)}
        {pick('To', rightId, setRightId)}
      </div>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-stone-600">
          {changed === 0
            ? 'No values or sources differ.'
            : `${changed} ${changed === 1 ? 'value differs' : 'values differ'}.`}
        </p>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={onlyChanges} onChange={(e) => setOnlyChanges(e.target.checked)} />
          Only what changed
        </label>
      </div>
      <ScrollRegion label="Version differences">
        <table className="w-full text-sm" aria-label="Version differences">
          <thead>
            <tr className="border-b border-stone-300 text-left text-stone-600">
              <th>Value</th>
              <th>Version {left?.version}</th>
              <th>Version {right?.version}</th>
            </tr>
          </thead>
          <tbody>
            {rows
              .filter((r) => r.changed || !onlyChanges)
              .map(({ f, a, b, changed: isChanged }) => (
                <tr
                  key={f.path}
                  data-changed={isChanged}
                  className={`border-b border-stone-100 align-top ${isChanged ? 'bg-amber-50' : ''}`}
                >
                  <td className="py-1 pr-2">
                    {f.label}
                    {f.unit ? ` (${f.unit})` : ''}
                  </td>
                  <td className="pr-2">
                    <span className="font-mono">{a.shown}</span>
                    <span className="block text-xs text-stone-600">{a.source}</span>
                  </td>
                  <td>
                    <span className="font-mono">{b.shown}</span>
                    <span className="block text-xs text-stone-600">{b.source}</span>
                  </td>
                </tr>
              ))}
          </tbody>
        </table>
      </ScrollRegion>
    </div>
  );
}
