import type { MyJob } from '@shared/crew/crew-views';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { useMyJobs } from '../api/get-my-jobs';
import { MyJobCard } from './my-job-card';

const groups: { title: string; match: (j: MyJob) => boolean }[] = [
  { title: 'Taken: pick a day', match: (j) => j.status === 'crew_assigned' && !j.scheduledFor },
  { title: 'Planned', match: (j) => j.status === 'crew_assigned' && Boolean(j.scheduledFor) },
  { title: 'Under way', match: (j) => j.status === 'under_construction' },
  { title: 'Built, with the office', match: (j) => j.status === 'built' },
  { title: 'Finished this month', match: (j) => j.status === 'closed' },
];

export function MyJobsList() {
  const mine = useMyJobs();
  if (mine.isPending) return <Loading label="Loading your jobs…" />;
  if (mine.error) return <ErrorNotice error={mine.error} />;
  if (mine.data.jobs.length === 0) return <Notice title="No jobs yet">Take one from the released jobs.</Notice>;
  return (
    <div className="space-y-8">
      {groups.map(({ title, match }) => {
        const list = mine.data.jobs.filter(match);
        if (list.length === 0) return null;
        return (
          <section key={title} aria-label={title} className="space-y-3">
            <h2 className="text-xl font-bold text-pine-900">
              {title} <span className="text-base font-normal text-stone-600">({list.length})</span>
            </h2>
            {list.map((job) => (
              <MyJobCard key={job.requestId} job={job} />
            ))}
          </section>
        );
      })}
    </div>
  );
}
