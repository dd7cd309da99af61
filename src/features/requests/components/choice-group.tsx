import { useId, type InputHTMLAttributes } from 'react';

interface ChoiceGroupProps {
  legend: string;
  hint?: string;
  error?: string;
  type: 'radio' | 'checkbox';
  options: readonly string[];
  labels: Record<string, string>;
  /** What `register(name)` returns, spread on every option so the form reads the group as one field. */
  inputProps: InputHTMLAttributes<HTMLInputElement> & { ref?: React.Ref<HTMLInputElement> };
}

/** A fieldset whose legend names the question; each option has its own label, the error is read with the group. */
export function ChoiceGroup({ legend, hint, error, type, options, labels, inputProps }: ChoiceGroupProps) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <fieldset className="flex flex-col gap-1" aria-describedby={describedBy} aria-invalid={Boolean(error) || undefined}>
      <legend className="mb-1 text-sm font-semibold text-stone-800">{legend}</legend>
      {hint && (
        <p id={`${id}-hint`} className="text-xs text-stone-600">
          {hint}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        {options.map((option) => (
          <label
            key={option}
            className="flex cursor-pointer items-center gap-2 rounded-md border border-stone-300 bg-white px-3 py-2 text-sm has-[:checked]:border-pine-500 has-[:checked]:bg-pine-50"
          >
            <input
              type={type}
              value={option}
              className="accent-pine-700"
              aria-invalid={Boolean(error) || undefined}
              {...inputProps}
            />
            {labels[option]}
          </label>
        ))}
      </div>
      {error && (
        <p id={`${id}-error`} className="text-sm font-medium text-clay">
          {error}
        </p>
      )}
    </fieldset>
  );
}
