import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useCreateJurisdiction } from '../api/create-jurisdiction';

/** A new road authority starts as a draft copied from the common rural template (4% landing for 20 ft, 17% maximum). */
export function NewJurisdictionForm() {
  const [name, setName] = useState('');
  const [authority, setAuthority] = useState('');
  const create = useCreateJurisdiction();
  const navigate = useNavigate();
  const fields = create.error instanceof ApiError ? create.error.fields : {};
  return (
    <form
      className="grid gap-4 sm:grid-cols-[1fr_1fr_auto] sm:items-end"
      onSubmit={(e) => {
        e.preventDefault();
        create.mutate(
          { name, authority },
          { onSuccess: (r) => navigate(paths.office.ruleProfile.getHref(r.jurisdiction.id)) },
        );
      }}
    >
      <Field label="Jurisdiction" error={fields.name}>
        {({ id }) => <TextInput id={id} value={name} onChange={(e) => setName(e.target.value)} />}
      </Field>
      <Field label="Road authority" error={fields.authority}>
        {({ id }) => <TextInput id={id} value={authority} onChange={(e) => setAuthority(e.target.value)} />}
      </Field>
      <Button type="submit" disabled={create.isPending}>
        Start from the template
      </Button>
      <div className="sm:col-span-3">
        <ErrorNotice error={create.error && !Object.keys(fields).length ? create.error : null} />
      </div>
    </form>
  );
}
