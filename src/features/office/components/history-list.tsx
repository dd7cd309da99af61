import { eventKindLabel } from '@shared/workflow/event-kinds';
import { roleLabels, statusText } from '@shared/workflow/statuses';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useRequestEvents } from '../api/get-request-events';
import { formatWhen } from './time-in-status';

/** Every status change and office event, oldest first, as the record of who did what. */
export function HistoryList({ requestId }: { requestId: string }) {
  const events = useRequestEvents(requestId);
  if (events.isPending) return <Loading />;
  if (events.error) return <ErrorNotice error={events.error} />;
  return (
    <ol className="relative space-y-4 border-l-2 border-pine-200 pl-5">
      {events.data.events.map((e) => (
        <li key={e.id}>
          <span className="absolute -left-[7px] mt-1.5 size-3 rounded-full border-2 border-white bg-pine-500" aria-hidden="true" />
          <p className="font-semibold text-pine-900">
            {e.kind === 'transition' && e.toStatus
              ? (e.fromStatus ? `${statusText[e.fromStatus].label} → ${statusText[e.toStatus].label}` : statusText[e.toStatus].label)
              : eventKindLabel(e.kind)}
            {e.internal && <span className="ml-2 rounded bg-tape px-1.5 py-0.5 text-xs text-pine-900">Office only</span>}
          </p>
          <p className="text-xs text-stone-600">
            {formatWhen(e.createdAt)} · {e.actorName ?? 'Gradepass'}{e.actorRole ? ` (${roleLabels[e.actorRole]})` : ''}
          </p>
          {e.note && <p className="mt-1 whitespace-pre-wrap text-sm">{e.note}</p>}
        </li>
      ))}
    </ol>
  );
}
