import { Link } from 'react-router';
import type { MyJob } from '@shared/crew/crew-views';
import { allowedTransitions, type TransitionAction } from '@shared/workflow/transitions';
import { ConfirmButton } from '@/components/ui/confirm-button';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { StatusBadge } from '@/components/ui/status-badge';
import { paths } from '@/config/paths';
import { useStartWork } from '../api/start-work';
import { day } from './format';
import { HandBackForm } from './hand-back-form';
import { ScheduleForm } from './schedule-form';

const linkButton =
  'inline-flex min-h-11 items-center rounded-md border-2 border-pine-700 bg-white px-4 font-semibold text-pine-800';

/** One of my jobs, with the next things to do for it at hand. */
export function MyJobCard({ job }: { job: MyJob }) {
  const start = useStartWork();
  // The moves offered are the shared table's, as the server checks them.
  const can = (action: TransitionAction) => allowedTransitions(job.status, 'crew').some((t) => t.action === action);
  return (
    <article
      className="space-y-3 rounded-lg border-2 border-stone-300 bg-white p-4 text-base"
      aria-labelledby={`my-${job.requestId}`}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`my-${job.requestId}`} className="text-lg font-bold text-pine-900">
          {job.siteAddress}
        </h3>
        <span className="flex items-center gap-2">
          <StatusBadge status={job.status} />
          <span className="font-mono text-sm text-stone-600">{job.reference}</span>
        </span>
      </div>
      <p className="text-stone-700">
        {job.roadName} · {job.applicantName} · wants it: {job.wanted.label}
        {job.scheduledFor && (
          <>
            {' '}
            · <strong>planned for {day(job.scheduledFor)}</strong>
          </>
        )}
      </p>
      {job.sentBackNote && (
        <Notice tone="warn" title="The office sent this back">
          {job.sentBackNote}
        </Notice>
      )}
      {job.status === 'built' && (
        <p>
          Waiting for the office to review the as-built grades
          {job.lastAsBuilt ? ` (${job.lastAsBuilt.passed ? 'passing' : 'failing, with your note'})` : ''}.
        </p>
      )}
      {job.status === 'crew_assigned' && <ScheduleForm job={job} />}
      {start.error && <ErrorNotice error={start.error} />}
      <div className="flex flex-wrap gap-3">
        <Link to={paths.crew.fieldSheet.getHref(job.requestId)} className={linkButton}>
          Field sheet
        </Link>
        {can('start-work') && (
          <ConfirmButton
            question={`Start work at ${job.siteAddress}? The homeowner and the office are told the crew is building; this cannot be undone from here.`}
            confirmLabel="Yes, start work"
            onConfirm={() => start.mutate({ id: job.requestId, expectedVersion: job.version })}
            disabled={start.isPending}
            className="min-h-11"
          >
            Start work
          </ConfirmButton>
        )}
        {can('mark-built') && (
          <Link to={paths.crew.asBuilt.getHref(job.requestId)} className={linkButton}>
            Enter as-built readings
          </Link>
        )}
        {can('hand-back') && <HandBackForm job={job} />}
      </div>
    </article>
  );
}
