import { Field, SelectInput } from '@/components/ui/field';
import type { JurisdictionSummary } from '@shared/contracts/rule-profiles';

/** Only published versions make a record; the jurisdiction's current one is used. */
export function RuleProfilePicker({
  choices,
  value,
  onChange,
}: {
  choices: JurisdictionSummary[];
  value: string;
  onChange: (jurisdictionId: string) => void;
}) {
  const usable = choices.filter((j) => j.currentVersionId);
  return (
    <Field label="Road authority's rule profile" hint="Checks use the authority's current published version.">
      {({ id }) => (
        <SelectInput id={id} value={value} onChange={(e) => onChange(e.target.value)}>
          <option value="">Choose…</option>
          {usable.map((j) => {
            const current = j.versions.find((v) => v.id === j.currentVersionId);
            return (
              <option key={j.id} value={j.id}>
                {j.name} (version {current?.version ?? '?'})
              </option>
            );
          })}
        </SelectInput>
      )}
    </Field>
  );
}
