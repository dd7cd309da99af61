import { Field, SelectInput, TextInput } from '@/components/ui/field';

interface NumberBoxProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  hint?: string;
  placeholder?: string;
}

/** A measurement box: typed as text so "0+20" and half-typed numbers survive, checked by the live check. */
export function NumberBox({ label, value, onChange, error, hint, placeholder }: NumberBoxProps) {
  return (
    <Field label={label} hint={hint} error={error}>
      {({ id, describedBy, invalid }) => (
        <TextInput
          id={id}
          inputMode="decimal"
          value={value}
          placeholder={placeholder}
          aria-describedby={describedBy}
          aria-invalid={invalid}
          onChange={(e) => onChange(e.target.value)}
        />
      )}
    </Field>
  );
}

export function ChoiceBox<T extends string>({
  label,
  value,
  options,
  onChange,
}: {
  label: string;
  value: T;
  options: readonly (readonly [T, string])[];
  onChange: (value: T) => void;
}) {
  return (
    <Field label={label}>
      {({ id }) => (
        <SelectInput id={id} value={value} onChange={(e) => onChange(e.target.value as T)}>
          {options.map(([v, text]) => (
            <option key={v} value={v}>
              {text}
            </option>
          ))}
        </SelectInput>
      )}
    </Field>
  );
}
