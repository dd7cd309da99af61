import { useState, type FormEvent } from 'react';
import type { MyJob } from '@shared/crew/crew-views';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useScheduleJob } from '../api/schedule-job';
import { day, todayLocal } from './format';

/** Pick the day; the homeowner gets an e-mail with it (and another if it moves). */
export function ScheduleForm({ job }: { job: MyJob }) {
  const schedule = useScheduleJob();
  const [date, setDate] = useState(job.scheduledFor ?? '');
  const [note, setNote] = useState('');
  const fields = schedule.error instanceof ApiError ? schedule.error.fields : {};
  const submit = (event: FormEvent) => {
    event.preventDefault();
    schedule.mutate({ id: job.requestId, date, note: note || undefined });
  };
  return (
    <form onSubmit={submit} noValidate className="grid gap-3 sm:grid-cols-[12rem_1fr_auto] sm:items-end">
      <Field
        label="Work day"
        error={fields.date}
        hint={job.permit.expiresOn ? `Permit expires ${day(job.permit.expiresOn)}` : undefined}
      >
        {({ id, describedBy, invalid }) => (
          <TextInput
            id={id}
            type="date"
            min={todayLocal()}
            max={job.permit.expiresOn ?? undefined}
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={date}
            onChange={(e) => setDate(e.target.value)}
          />
        )}
      </Field>
      <Field label="Note for the homeowner (optional)" error={fields.note}>
        {({ id, describedBy, invalid }) => (
          <TextInput
            id={id}
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={note}
            onChange={(e) => setNote(e.target.value)}
          />
        )}
      </Field>
      <Button type="submit" disabled={schedule.isPending} className="min-h-11">
        {job.scheduledFor ? 'Move to this day' : 'Plan this day'}
      </Button>
      <div className="sm:col-span-3">
        {job.scheduledFor && (
          <Notice title={`Planned for ${day(job.scheduledFor)}`}>
            The homeowner has been e-mailed the day; moving it sends another e-mail.
          </Notice>
        )}
        {schedule.error && <ErrorNotice error={schedule.error} />}
      </div>
    </form>
  );
}
