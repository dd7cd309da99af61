import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ApiError } from '@/lib/api-client';
import { useUpdateUser } from '../api/update-user';

/** A person's name in the people list, with "Edit name" to correct it in place. */
export function PersonName({ id, name }: { id: string; name: string }) {
  const [editing, setEditing] = useState(false);
  const [value, setValue] = useState(name);
  const inputId = useId();
  const update = useUpdateUser();
  const error = update.error instanceof ApiError ? (update.error.fields.name ?? update.error.message) : undefined;
  if (!editing)
    return (
      <span className="flex flex-wrap items-center gap-2">
        <span className="font-semibold">{name}</span>
        <Button
          variant="quiet"
          className="px-1 py-0"
          aria-label={`Edit name of ${name}`}
          onClick={() => {
            setValue(name);
            update.reset();
            setEditing(true);
          }}
        >
          Edit name
        </Button>
      </span>
    );
  return (
    <form
      className="flex flex-wrap items-center gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        update.mutate({ id, name: value }, { onSuccess: () => setEditing(false) });
      }}
    >
      <label htmlFor={inputId} className="sr-only">
        Name
      </label>
      <input
        id={inputId}
        className="rounded border border-stone-300 px-2 py-1"
        value={value}
        maxLength={120}
        aria-invalid={Boolean(error)}
        aria-describedby={error ? `${inputId}-error` : undefined}
        onChange={(e) => setValue(e.target.value)}
      />
      <Button type="submit" className="px-3 py-1" disabled={update.isPending}>
        Save name
      </Button>
      <Button variant="secondary" className="px-3 py-1" onClick={() => setEditing(false)}>
        Cancel
      </Button>
      {error && (
        <p id={`${inputId}-error`} className="w-full text-sm font-medium text-clay">
          {error}
        </p>
      )}
    </form>
  );
}
