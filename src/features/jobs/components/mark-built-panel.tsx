import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import type { AsBuiltPageView } from '@shared/crew/crew-views';
import { formFieldsOf } from '@shared/workflow/transition-inputs';
import { Button } from '@/components/ui/button';
import { Field, TextArea } from '@/components/ui/field';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useMarkBuilt } from '../api/mark-built';

const [reasonField] = formFieldsOf('mark-built');

/** "Built" goes to the office with the last saved set; a failing set goes with the crew's explanation. */
export function MarkBuiltPanel({ page }: { page: AsBuiltPageView }) {
  const markBuilt = useMarkBuilt();
  const navigate = useNavigate();
  const [note, setNote] = useState('');
  const latest = page.sets[0];
  const fields = markBuilt.error instanceof ApiError ? markBuilt.error.fields : {};
  if (page.job.status !== 'under_construction')
    return <Notice title="Marked built">This job is with the office for review.</Notice>;
  if (!latest) return <p>Save a set of readings first; then mark the job built.</p>;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    markBuilt.mutate(
      { id: page.job.requestId, expectedVersion: page.job.version, note: note || undefined },
      {
        onSuccess: () => navigate(paths.crew.myJobs.getHref()),
      },
    );
  };
  return (
    <form onSubmit={submit} noValidate className="space-y-3">
      {latest.passed ? (
        <p>
          The last saved set passes
          {latest.status === 'advisory' ? ', with readings inside the tolerance for the inspector to judge' : ''}.
        </p>
      ) : (
        <Notice tone="warn" title="The last saved set fails">
          Say what you found and why; the office reads it before closing or sending the job back.
        </Notice>
      )}
      <Field label={latest.passed ? 'Note for the office (optional)' : reasonField.text.label} error={fields.note}>
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
      {markBuilt.error && <ErrorNotice error={markBuilt.error} />}
      <Button type="submit" disabled={markBuilt.isPending} className="min-h-12 px-6 text-base">
        Mark built
      </Button>
    </form>
  );
}
