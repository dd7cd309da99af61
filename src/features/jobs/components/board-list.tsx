import { useState } from 'react';
import { useNavigate } from 'react-router';
import type { BoardSort } from '@shared/crew/crew-inputs';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useAcceptJob } from '../api/accept-job';
import { useBoard } from '../api/get-board';
import { JobCard } from './job-card';

const sorts: { value: BoardSort; label: string }[] = [
  { value: 'date', label: 'Soonest wanted first' },
  { value: 'distance', label: 'Nearest the yard first' },
];

/** The released jobs. Taking one is a race the server settles; the loser is told who won and the list refreshes. */
export function BoardList({ canTake }: { canTake: boolean }) {
  const [sort, setSort] = useState<BoardSort>('date');
  const board = useBoard(sort);
  const accept = useAcceptJob();
  const navigate = useNavigate();
  const take = (id: string, expectedVersion: number) =>
    accept.mutate({ id, expectedVersion }, { onSuccess: () => navigate(paths.crew.myJobs.getHref()) });

  return (
    <div className="space-y-4">
      <div role="group" aria-label="Order the jobs" className="flex flex-wrap gap-2">
        {sorts.map((s) => (
          <button
            key={s.value}
            type="button"
            aria-pressed={sort === s.value}
            onClick={() => setSort(s.value)}
            className={`min-h-11 rounded-md border-2 px-4 font-semibold ${sort === s.value ? 'border-pine-800 bg-pine-800 text-white' : 'border-stone-400 bg-white text-stone-900'}`}
          >
            {s.label}
          </button>
        ))}
      </div>
      {sort === 'distance' && board.data && !board.data.yard && (
        <Notice tone="warn" title="No yard location set">
          The owner sets the yard on this page; until then jobs keep the date order.
        </Notice>
      )}
      {accept.error && <ErrorNotice error={accept.error} />}
      {board.isPending && <Loading label="Loading released jobs…" />}
      {board.error && <ErrorNotice error={board.error} />}
      {board.data && board.data.jobs.length === 0 && (
        <Notice title="No jobs waiting">
          Every released job has a crew. New ones appear here when the office releases them, and you get an e-mail.
        </Notice>
      )}
      {board.data?.jobs.map((job) => (
        <JobCard
          key={job.requestId}
          job={job}
          canTake={canTake}
          taking={accept.isPending && accept.variables?.id === job.requestId}
          onTake={() => take(job.requestId, job.version)}
        />
      ))}
    </div>
  );
}
