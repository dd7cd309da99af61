import { useState } from 'react';
import { defaultLinkDays, maxLinkDays } from '@shared/contracts/inspections';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useSendInspectorLink } from '../api/send-inspector-link';

/** The office sends the road authority's inspector a link to the built job. */
export function SendLinkForm({ requestId }: { requestId: string }) {
  const [name, setName] = useState('');
  const [email, setEmail] = useState('');
  const [days, setDays] = useState(String(defaultLinkDays));
  const send = useSendInspectorLink(requestId);
  const fields = send.error instanceof ApiError ? send.error.fields : {};
  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        send.mutate(
          { inspectorName: name, inspectorEmail: email, daysValid: Number(days) },
          {
            onSuccess: () => {
              setName('');
              setEmail('');
            },
          },
        );
      }}
    >
      <div className="grid gap-3 sm:grid-cols-[2fr_2fr_1fr]">
        <Field label="Inspector’s name" error={fields.inspectorName}>
          {({ id, invalid }) => (
            <TextInput id={id} value={name} aria-invalid={invalid} onChange={(e) => setName(e.target.value)} />
          )}
        </Field>
        <Field label="Inspector’s e-mail" error={fields.inspectorEmail}>
          {({ id, invalid }) => (
            <TextInput
              id={id}
              type="email"
              value={email}
              aria-invalid={invalid}
              onChange={(e) => setEmail(e.target.value)}
            />
          )}
        </Field>
        <Field label={`Link works for (days, up to ${maxLinkDays})`} error={fields.daysValid}>
          {({ id, invalid }) => (
            <TextInput
              id={id}
              inputMode="numeric"
              value={days}
              aria-invalid={invalid}
              onChange={(e) => setDays(e.target.value)}
            />
          )}
        </Field>
      </div>
      <Button type="submit" disabled={send.isPending}>
        {send.isPending ? 'Sending…' : 'E-mail the link'}
      </Button>
      {send.error && !Object.keys(fields).length ? <ErrorNotice error={send.error} /> : null}
      {send.data && (
        <Notice title={`Link e-mailed to ${send.data.link.inspectorEmail}.`}>
          <p className="break-all">
            You can also give it by hand; it is shown only now: <span className="font-mono">{send.data.url}</span>
          </p>
        </Notice>
      )}
    </form>
  );
}
