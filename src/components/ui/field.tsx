import {
  useId,
  type ReactNode,
  type InputHTMLAttributes,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';

interface FieldProps {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  children: (ids: { id: string; describedBy?: string; invalid: boolean }) => ReactNode;
}

/** A label tied to its control, with a hint and an error read out by screen readers. */
export function Field({ label, hint, error, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-stone-800">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-xs text-stone-600">
          {hint}
        </p>
      )}
      {children({ id, describedBy, invalid: Boolean(error) })}
      {error && (
        <p id={errorId} className="text-sm font-medium text-clay">
          {error}
        </p>
      )}
    </div>
  );
}

const control =
  'w-full rounded-md border border-stone-300 bg-white px-3 py-2 text-base aria-[invalid=true]:border-clay aria-[invalid=true]:ring-1 aria-[invalid=true]:ring-clay';

export const TextInput = (props: InputHTMLAttributes<HTMLInputElement>) => <input className={control} {...props} />;
export const SelectInput = (props: SelectHTMLAttributes<HTMLSelectElement>) => (
  <select className={control} {...props} />
);
export const TextArea = (props: TextareaHTMLAttributes<HTMLTextAreaElement>) => (
  <textarea className={control} rows={4} {...props} />
);
