import { useState } from 'react';
import type { InspectorPageView } from '@shared/contracts/inspections';
import { Button } from '@/components/ui/button';
import { Field, TextArea, TextInput } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useRecordOutcome } from '../api/record-outcome';

/** The inspector's verdict: passed, or failed with the items to fix, under their own name. */
export function OutcomeForm({ page, token }: { page: InspectorPageView; token: string }) {
  const [outcome, setOutcome] = useState<'passed' | 'failed' | ''>('');
  const [name, setName] = useState(page.link.inspectorName);
  const [items, setItems] = useState('');
  const [note, setNote] = useState('');
  const record = useRecordOutcome(page.request.id, token);
  const fields = record.error instanceof ApiError ? record.error.fields : {};
  const choice = (value: 'passed' | 'failed', label: string) => (
    <label className="flex min-h-11 items-center gap-2 rounded-md border border-stone-300 px-3 py-2">
      <input type="radio" name="outcome" value={value} checked={outcome === value} onChange={() => setOutcome(value)} />
      <span className="font-semibold">{label}</span>
    </label>
  );
  return (
    <form
      className="space-y-4"
      onSubmit={(e) => {
        e.preventDefault();
        if (!outcome) return;
        record.mutate({ outcome, inspectorName: name, items: outcome === 'failed' ? items : '', note });
      }}
    >
      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold text-stone-800">Outcome</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          {choice('passed', 'Passed')}
          {choice('failed', 'Failed: items to fix')}
        </div>
        {fields.outcome && <p className="text-sm font-medium text-clay">{fields.outcome}</p>}
      </fieldset>
      {outcome === 'failed' && (
        <Field
          label="What must be fixed"
          hint="One item per line. The crew goes back to fix these, and the office and the owner read them."
          error={fields.items}
        >
          {({ id, describedBy, invalid }) => (
            <TextArea
              id={id}
              value={items}
              aria-describedby={describedBy}
              aria-invalid={invalid}
              onChange={(e) => setItems(e.target.value)}
            />
          )}
        </Field>
      )}
      <Field label="Your name" error={fields.inspectorName}>
        {({ id, invalid }) => (
          <TextInput id={id} value={name} aria-invalid={invalid} onChange={(e) => setName(e.target.value)} />
        )}
      </Field>
      <Field label="Note (optional)" error={fields.note}>
        {({ id, invalid }) => (
          <TextArea id={id} rows={2} value={note} aria-invalid={invalid} onChange={(e) => setNote(e.target.value)} />
        )}
      </Field>
      {record.error && !Object.keys(fields).length ? <ErrorNotice error={record.error} /> : null}
      <Button type="submit" disabled={!outcome || record.isPending} className="w-full sm:w-auto">
        {record.isPending ? 'Recording…' : 'Record the outcome'}
      </Button>
    </form>
  );
}
