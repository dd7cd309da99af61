import { useState, type FormEvent } from 'react';
import { roleLabels, roles, type Role } from '@shared/workflow/statuses';
import { Button } from '@/components/ui/button';
import { Field, SelectInput, TextInput } from '@/components/ui/field';
import { ApiError } from '@/lib/api-client';
import { useInviteUser } from '../api/update-user';

/** Add a colleague before their first sign-in, so they arrive with the right role. */
export function InviteUserForm() {
  const invite = useInviteUser();
  const [form, setForm] = useState({ email: '', name: '', role: 'staff' as Role });
  const fields = invite.error instanceof ApiError ? invite.error.fields : {};
  const submit = (event: FormEvent) => {
    event.preventDefault();
    invite.mutate(form, { onSuccess: () => setForm({ email: '', name: '', role: 'staff' }) });
  };
  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-4 sm:items-end" noValidate>
      <Field label="Name" error={fields.name}>
        {({ id, describedBy, invalid }) => (
          <TextInput
            id={id}
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={form.name}
            onChange={(e) => setForm({ ...form, name: e.target.value })}
          />
        )}
      </Field>
      <Field label="E-mail" error={fields.email}>
        {({ id, describedBy, invalid }) => (
          <TextInput
            id={id}
            type="email"
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={form.email}
            onChange={(e) => setForm({ ...form, email: e.target.value })}
          />
        )}
      </Field>
      <Field label="Role">
        {({ id }) => (
          <SelectInput id={id} value={form.role} onChange={(e) => setForm({ ...form, role: e.target.value as Role })}>
            {roles.map((r) => (
              <option key={r} value={r}>
                {roleLabels[r]}
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
      <Button type="submit" disabled={invite.isPending}>
        Add person
      </Button>
      {invite.error && (
        <p role="alert" className="text-sm font-medium text-clay sm:col-span-4">
          {invite.error.message}
        </p>
      )}
    </form>
  );
}
