import { useState, type FormEvent } from 'react';
import type { Transition } from '@shared/workflow/transitions';
import { Button } from '@/components/ui/button';
import { Field, TextArea, TextInput } from '@/components/ui/field';
import { ApiError } from '@/lib/api-client';
import type { OfficeRequestView as OfficeRequest } from '@shared/contracts/requests';
import type { TransitionInput } from '../api/run-office-transition';

const noteLabel: Record<string, { label: string; hint: string }> = {
  reason: { label: 'Reason', hint: 'The property owner reads this in the e-mail and on their request page.' },
  questions: { label: 'Questions for the property owner', hint: 'Ask plainly; they answer from their request page.' },
  note: { label: 'What needs doing', hint: 'The crew reads this.' },
};

/** The datetime-local control speaks local time without a zone; the API wants an instant. */
const toInstant = (local: string) => (local ? new Date(local).toISOString() : undefined);

interface ActionFormProps {
  transition: Transition;
  request: OfficeRequest;
  pending: boolean;
  error: unknown;
  onSubmit: (input: TransitionInput) => void;
  onCancel: () => void;
}

/** Asks for exactly what the chosen action needs, from the same table the server checks against. */
export function ActionForm({ transition, request, pending, error, onSubmit, onCancel }: ActionFormProps) {
  const needs = transition.needs;
  const noteNeed = needs.find((n) => n in noteLabel);
  const permit = needs.includes('permit');
  const deciding = permit && transition.action !== 'file-permit';
  const [note, setNote] = useState('');
  const [visitAt, setVisitAt] = useState('');
  const [permitReference, setPermitReference] = useState(request.permitReference ?? '');
  const [permitDecidedOn, setPermitDecidedOn] = useState('');
  const [permitConditions, setPermitConditions] = useState(request.permitConditions ?? '');
  const [permitExpiresOn, setPermitExpiresOn] = useState('');
  const fields = error instanceof ApiError ? error.fields : {};

  const submit = (e: FormEvent) => {
    e.preventDefault();
    onSubmit({
      action: transition.action,
      expectedVersion: request.version,
      note: note.trim() || undefined,
      visitAt: needs.includes('visitDate') ? toInstant(visitAt) : undefined,
      permitReference: permit ? permitReference.trim() || undefined : undefined,
      permitDecidedOn: deciding ? permitDecidedOn || undefined : undefined,
      permitConditions: transition.action === 'record-granted' ? permitConditions.trim() || undefined : undefined,
      permitExpiresOn: transition.action === 'record-granted' ? permitExpiresOn || undefined : undefined,
    });
  };

  return (
    <form onSubmit={submit} className="space-y-3 rounded-md border border-tape bg-amber-50/40 p-4" aria-label={transition.label}>
      <p className="font-semibold text-pine-900">{transition.label}</p>
      {needs.includes('visitDate') && (
        <Field label="Date and time of the site visit" error={fields.visitAt}>
          {({ id, describedBy, invalid }) => <TextInput id={id} type="datetime-local" required value={visitAt} onChange={(e) => setVisitAt(e.target.value)} aria-describedby={describedBy} aria-invalid={invalid} />}
        </Field>
      )}
      {permit && (
        <Field label="Permit reference" hint="The road authority’s application or permit number." error={fields.permitReference}>
          {({ id, describedBy, invalid }) => <TextInput id={id} required={transition.action === 'file-permit'} value={permitReference} onChange={(e) => setPermitReference(e.target.value)} aria-describedby={describedBy} aria-invalid={invalid} />}
        </Field>
      )}
      {deciding && (
        <Field label="Decided on" error={fields.permitDecidedOn}>
          {({ id, describedBy, invalid }) => <TextInput id={id} type="date" required value={permitDecidedOn} onChange={(e) => setPermitDecidedOn(e.target.value)} aria-describedby={describedBy} aria-invalid={invalid} />}
        </Field>
      )}
      {transition.action === 'record-granted' && (
        <>
          <Field label="Conditions (optional)" hint="E.g. traffic control, working hours, inspection before paving." error={fields.permitConditions}>
            {({ id, describedBy, invalid }) => <TextArea id={id} value={permitConditions} onChange={(e) => setPermitConditions(e.target.value)} aria-describedby={describedBy} aria-invalid={invalid} />}
          </Field>
          <Field label="Permit expires on (optional)" error={fields.permitExpiresOn}>
            {({ id, describedBy, invalid }) => <TextInput id={id} type="date" value={permitExpiresOn} onChange={(e) => setPermitExpiresOn(e.target.value)} aria-describedby={describedBy} aria-invalid={invalid} />}
          </Field>
        </>
      )}
      <Field label={noteNeed ? noteLabel[noteNeed].label : 'Note (optional)'} hint={noteNeed ? noteLabel[noteNeed].hint : 'Shown in the history and the e-mail.'} error={fields.note}>
        {({ id, describedBy, invalid }) => <TextArea id={id} required={Boolean(noteNeed)} value={note} onChange={(e) => setNote(e.target.value)} aria-describedby={describedBy} aria-invalid={invalid} />}
      </Field>
      <div className="flex gap-2">
        <Button type="submit" disabled={pending}>{pending ? 'Saving…' : transition.label}</Button>
        <Button variant="secondary" onClick={onCancel} disabled={pending}>Cancel</Button>
      </div>
    </form>
  );
}
