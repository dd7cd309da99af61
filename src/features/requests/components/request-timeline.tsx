import { eventKindLabel } from '@shared/workflow/event-kinds';
import { statusText } from '@shared/workflow/statuses';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useEvents } from '../api/get-events';
import type { RequestEvent } from '../api/types';

const stamp = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function describe(event: RequestEvent) {
  if (event.toStatus && event.fromStatus !== event.toStatus) return statusText[event.toStatus].label;
  return eventKindLabel(event.kind);
}

/** Everything that happened to the request that its reader may know, oldest first. */
export function RequestTimeline({ requestId }: { requestId: string }) {
  const { data, error, isPending } = useEvents(requestId);
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  if (data.events.length === 0) return <p className="text-sm text-stone-500">Nothing has happened yet: the request is still a draft.</p>;
  return (
    <ol className="relative space-y-4 border-l-2 border-pine-200 pl-5" aria-label="Timeline">
      {data.events.map((event) => (
        <li key={event.id} className="relative">
          <span aria-hidden className="absolute -left-[27px] top-1 h-3 w-3 rounded-full border-2 border-white bg-pine-500" />
          <p className="font-semibold text-pine-900">{describe(event)}</p>
          <p className="text-xs text-stone-500"><time dateTime={event.createdAt}>{stamp(event.createdAt)}</time>{event.actorName ? ` · ${event.actorName}` : ''}</p>
          {event.note && <p className="mt-1 whitespace-pre-line text-sm text-stone-800">{event.note}</p>}
        </li>
      ))}
    </ol>
  );
}
