import { Link } from 'react-router';
import { StatusBadge } from '@/components/ui/status-badge';
import { paths } from '@/config/paths';
import type { QueueRow } from '../api/types';
import { AssignControl } from './assign-control';
import { timeInStatus } from './time-in-status';

/** The queue on a phone: one card per request with the same facts as the table's row. */
export function QueueCards({ rows, meId }: { rows: QueueRow[]; meId: string }) {
  return (
    <ul className="space-y-3">
      {rows.map((row) => (
        <li key={row.id} className="rounded-lg border border-stone-200 bg-white p-4">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <Link to={paths.office.request.getHref(row.id)} className="font-mono font-semibold text-pine-700 underline">
              {row.reference}
            </Link>
            <StatusBadge status={row.status} />
          </div>
          <p className="mt-1 font-semibold">{row.applicantName || '—'}</p>
          <p className="text-sm text-stone-600">
            {row.roadName || '—'} · {row.jurisdiction?.name ?? 'authority not matched yet'}
          </p>
          <p className="mt-1 text-sm">
            <span className="text-stone-600">In this status for </span>
            {timeInStatus(row.statusChangedAt)}
          </p>
          <p className={`mt-1 text-sm ${row.waitingOnUs ? 'font-semibold text-pine-900' : 'text-stone-600'}`}>
            {row.nextAction}
          </p>
          <div className="mt-2">
            <AssignControl
              requestId={row.id}
              assigneeId={row.assignee?.id ?? null}
              meId={meId}
              label={`Assignee for ${row.reference}`}
            />
          </div>
        </li>
      ))}
    </ul>
  );
}
