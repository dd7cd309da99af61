import { countOf } from '@shared/format/counts';
import { Link } from 'react-router';
import type { BoardJob } from '@shared/crew/crew-views';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { EarthworkLine } from './earthwork-line';
import { day } from './format';

interface Props {
  job: BoardJob;
  canTake: boolean;
  taking: boolean;
  onTake: () => void;
}

/** One released job, with what a crew lead weighs before taking it. Every control is a plain, large button. */
export function JobCard({ job, canTake, taking, onTake }: Props) {
  return (
    <article
      className="rounded-lg border-2 border-stone-300 bg-white p-4 text-base"
      aria-labelledby={`job-${job.requestId}`}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={`job-${job.requestId}`} className="text-xl font-bold text-pine-900">
          {job.siteAddress}
        </h2>
        <span className="font-mono text-sm text-stone-600">{job.reference}</span>
      </div>
      <p className="text-stone-700">
        On <strong>{job.roadName}</strong>
        {job.jurisdictionName ? ` · ${job.jurisdictionName}` : ''}
      </p>
      <dl className="mt-3 grid gap-x-6 gap-y-2 sm:grid-cols-2">
        <div>
          <dt className="text-sm font-semibold text-stone-600">Homeowner wants it</dt>
          <dd>
            {job.wanted.label}
            {job.wanted.wantedBy ? ` (by ${day(job.wanted.wantedBy)})` : ''}
          </dd>
        </div>
        <div>
          <dt className="text-sm font-semibold text-stone-600">From the yard</dt>
          <dd>
            {job.distanceMiles === null
              ? 'Not known (needs the yard and the site position)'
              : `${countOf(job.distanceMiles, 'mile')} in a straight line`}
          </dd>
        </div>
        <div>
          <dt className="text-sm font-semibold text-stone-600">Permit</dt>
          <dd>
            {job.permit.reference ?? 'No reference'}
            {job.permit.expiresOn ? `, expires ${day(job.permit.expiresOn)}` : ''}
          </dd>
        </div>
        <div>
          <dt className="text-sm font-semibold text-stone-600">Earthwork</dt>
          <dd>
            <EarthworkLine earthwork={job.earthwork} />
          </dd>
        </div>
        {job.permit.conditions && (
          <div className="sm:col-span-2">
            <dt className="text-sm font-semibold text-stone-600">Permit conditions</dt>
            <dd>{job.permit.conditions}</dd>
          </div>
        )}
        <div className="sm:col-span-2">
          <dt className="text-sm font-semibold text-stone-600">Grade check</dt>
          <dd>{job.check ? job.check.summary : 'No saved grade check.'}</dd>
        </div>
      </dl>
      <div className="mt-4 flex flex-wrap gap-3">
        {canTake && (
          <Button onClick={onTake} disabled={taking} className="min-h-12 px-6 text-base">
            {taking ? 'Taking…' : 'Take this job'}
          </Button>
        )}
        <Link
          to={paths.crew.fieldSheet.getHref(job.requestId)}
          className="inline-flex min-h-12 items-center rounded-md border-2 border-pine-700 px-5 font-semibold text-pine-800"
        >
          Field sheet
        </Link>
      </div>
    </article>
  );
}
