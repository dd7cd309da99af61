import { useState, type FormEvent } from 'react';
import { formFieldsOf, type FormField } from '@shared/workflow/transition-inputs';
import type { Transition } from '@shared/workflow/transitions';
import { Button } from '@/components/ui/button';
import { Field, SelectInput, TextArea, TextInput } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import type { OfficeRequestView as OfficeRequest } from '@shared/contracts/requests';
import type { TransitionBody } from '@shared/workflow/transition-inputs';

/** The datetime-local control speaks local time without a zone; the API wants an instant. */
const toInstant = (local: string) => (local ? new Date(local).toISOString() : undefined);
const inputType = { text: 'text', date: 'date', datetime: 'datetime-local', choice: 'text' } as const;

interface ActionFormProps {
  transition: Transition;
  request: OfficeRequest;
  /** Something the office should weigh before this move; it also makes the note required. */
  caution?: string;
  pending: boolean;
  error: unknown;
  onSubmit: (input: TransitionBody) => void;
  onCancel: () => void;
}

function startValues(fields: FormField[], request: OfficeRequest) {
  return Object.fromEntries(
    fields.map((f) => [
      f.name,
      f.text.prefill
        ? (request[f.text.prefill] ?? '')
        : f.text.control === 'choice'
          ? (f.text.options?.[0]?.[0] ?? '')
          : '',
    ]),
  );
}

/** Asks for exactly what the chosen action takes: its fields, labels and rules come from the action's shared input. */
export function ActionForm({ transition, request, caution, pending, error, onSubmit, onCancel }: ActionFormProps) {
  const fields = formFieldsOf(transition.action);
  const [values, setValues] = useState<Record<string, string>>(() => startValues(fields, request));
  const errors = error instanceof ApiError ? error.fields : {};

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const body: Record<string, string | undefined> = {};
    for (const field of fields) {
      const value = values[field.name].trim();
      body[field.name] = field.text.control === 'datetime' ? toInstant(value) : value || undefined;
    }
    onSubmit({ ...body, action: transition.action, expectedVersion: request.version } as TransitionBody);
  };

  return (
    <form
      onSubmit={submit}
      className="space-y-3 rounded-md border border-tape bg-amber-50/40 p-4"
      aria-label={transition.label}
    >
      <p className="font-semibold text-pine-900">{transition.label}</p>
      {caution && (
        <Notice tone="warn" title="Before you go on">
          {caution}
        </Notice>
      )}
      {fields.map((field) => {
        const required = field.required || (Boolean(caution) && field.name === 'note');
        const props = {
          required,
          value: values[field.name],
          onChange: (e: { target: { value: string } }) => setValues((v) => ({ ...v, [field.name]: e.target.value })),
        };
        return (
          <Field key={field.name} label={field.text.label} hint={field.text.hint} error={errors[field.name]}>
            {({ id, describedBy, invalid }) =>
              field.text.control === 'choice' ? (
                <SelectInput id={id} {...props} aria-describedby={describedBy} aria-invalid={invalid}>
                  {(field.text.options ?? []).map(([value, words]) => (
                    <option key={value} value={value}>
                      {words}
                    </option>
                  ))}
                </SelectInput>
              ) : field.text.control === 'textarea' ? (
                <TextArea id={id} {...props} aria-describedby={describedBy} aria-invalid={invalid} />
              ) : (
                <TextInput
                  id={id}
                  type={inputType[field.text.control]}
                  {...props}
                  aria-describedby={describedBy}
                  aria-invalid={invalid}
                />
              )
            }
          </Field>
        );
      })}
      <div className="flex gap-2">
        <Button type="submit" disabled={pending}>
          {pending ? 'Saving…' : transition.label}
        </Button>
        <Button variant="secondary" onClick={onCancel} disabled={pending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
