import { useState, type FormEvent } from 'react';
import type { MyJob } from '@shared/crew/crew-views';
import { formFieldsOf } from '@shared/workflow/transition-inputs';
import { Button } from '@/components/ui/button';
import { Field, TextArea } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useHandBackJob } from '../api/hand-back-job';

const [noteField] = formFieldsOf('hand-back');

/** Giving a job back is deliberate: the form opens on a button press and asks why, for the office. */
export function HandBackForm({ job }: { job: MyJob }) {
  const handBack = useHandBackJob();
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  const fields = handBack.error instanceof ApiError ? handBack.error.fields : {};
  if (!open)
    return (
      <Button variant="secondary" onClick={() => setOpen(true)} className="min-h-11">
        Hand the job back…
      </Button>
    );
  const submit = (event: FormEvent) => {
    event.preventDefault();
    handBack.mutate({ id: job.requestId, expectedVersion: job.version, note });
  };
  return (
    <form onSubmit={submit} noValidate className="w-full space-y-3 rounded-md border-2 border-clay/40 p-3">
      <Field label={noteField.text.label} hint={noteField.text.hint} error={fields.note}>
        {({ id, describedBy, invalid }) => (
          <TextArea
            id={id}
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={note}
            onChange={(e) => setNote(e.target.value)}
          />
        )}
      </Field>
      {handBack.error && <ErrorNotice error={handBack.error} />}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="danger" disabled={handBack.isPending} className="min-h-11">
          Hand it back
        </Button>
        <Button variant="secondary" onClick={() => setOpen(false)} className="min-h-11">
          Keep the job
        </Button>
      </div>
    </form>
  );
}
