import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useYard } from '../api/get-yard';
import { useSetYard } from '../api/set-yard';

/** The owner's one setting for the board: where the trucks leave from, as map coordinates. */
export function YardForm() {
  const yard = useYard();
  const save = useSetYard();
  const [form, setForm] = useState({ label: '', lat: '', lng: '' });
  // The boxes take the saved yard each time it arrives from the server, without an extra render pass.
  const [shown, setShown] = useState<typeof yard.data>();
  if (yard.data !== shown) {
    setShown(yard.data);
    const y = yard.data?.yard;
    if (y) setForm({ label: y.label, lat: String(y.lat), lng: String(y.lng) });
  }
  const fields = save.error instanceof ApiError ? save.error.fields : {};
  const number = (text: string) => (text.trim() === '' ? Number.NaN : Number(text));
  const submit = (event: FormEvent) => {
    event.preventDefault();
    // A blank or non-numeric box becomes NaN, which JSON sends as null: the server's 400 then names that box.
    save.mutate({ label: form.label, lat: number(form.lat), lng: number(form.lng) });
  };
  return (
    <form onSubmit={submit} noValidate className="grid gap-3 sm:grid-cols-4 sm:items-end">
      <Field label="Yard name" error={fields.label}>
        {({ id, describedBy, invalid }) => (
          <TextInput
            id={id}
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={form.label}
            onChange={(e) => setForm({ ...form, label: e.target.value })}
          />
        )}
      </Field>
      <Field label="Latitude" hint="e.g. 44.0312" error={fields.lat}>
        {({ id, describedBy, invalid }) => (
          <TextInput
            id={id}
            inputMode="decimal"
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={form.lat}
            onChange={(e) => setForm({ ...form, lat: e.target.value })}
          />
        )}
      </Field>
      <Field label="Longitude" hint="e.g. -72.6021" error={fields.lng}>
        {({ id, describedBy, invalid }) => (
          <TextInput
            id={id}
            inputMode="decimal"
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={form.lng}
            onChange={(e) => setForm({ ...form, lng: e.target.value })}
          />
        )}
      </Field>
      <Button type="submit" disabled={save.isPending}>
        Save the yard
      </Button>
      <div className="sm:col-span-4">
        {save.isSuccess && (
          <Notice title="Yard saved">Distances on the board are now measured from {save.data.yard.label}.</Notice>
        )}
        {save.error && !(save.error instanceof ApiError && Object.keys(fields).length > 0) && (
          <ErrorNotice error={save.error} />
        )}
      </div>
    </form>
  );
}
