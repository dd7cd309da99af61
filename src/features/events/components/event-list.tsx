import { formatMoment } from '@shared/format/dates';
import type { EventView } from '@shared/contracts/events';
import { eventKindLabel } from '@shared/workflow/event-kinds';
import { roleLabels, statusText } from '@shared/workflow/statuses';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useEvents } from '../api/get-events';
import { useOpenEventDocument } from '../api/open-event-document';

const stamp = (iso: string) => formatMoment(iso);

/** The office reads every move as from → to; the owner reads where the request went. */
function describe(event: EventView, office: boolean) {
  if (event.kind === 'transition' && event.toStatus && office) {
    return event.fromStatus
      ? `${statusText[event.fromStatus].label} → ${statusText[event.toStatus].label}`
      : statusText[event.toStatus].label;
  }
  if (!office && event.toStatus && event.fromStatus !== event.toStatus) return statusText[event.toStatus].label;
  return eventKindLabel(event.kind);
}

interface EventListProps {
  requestId: string;
  /** The office sees its own events marked, who acted in which role, and the moves as from → to. */
  office?: boolean;
  label?: string;
}

/** Everything that happened to the request that its reader may know, oldest first. */
export function EventList({ requestId, office = false, label = 'Timeline' }: EventListProps) {
  const { data, error, isPending } = useEvents(requestId);
  const openDocument = useOpenEventDocument(requestId);
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  if (data.events.length === 0)
    return <p className="text-sm text-stone-600">Nothing has happened yet: the request is still a draft.</p>;
  return (
    <ol className="relative space-y-4 border-l-2 border-pine-200 pl-5" aria-label={label}>
      {data.events.map((event) => (
        <li key={event.id} className="relative">
          <span
            aria-hidden
            className="absolute -left-[27px] top-1 h-3 w-3 rounded-full border-2 border-white bg-pine-500"
          />
          <p className="font-semibold text-pine-900">
            {describe(event, office)}
            {office && event.internal && (
              <span className="ml-2 rounded bg-tape px-1.5 py-0.5 text-xs text-pine-900">Office only</span>
            )}
          </p>
          <p className="text-xs text-stone-600">
            <time dateTime={event.createdAt}>{stamp(event.createdAt)}</time>
            {office
              ? ` · ${event.actorName ?? 'Gradepass'}${event.actorRole ? ` (${roleLabels[event.actorRole]})` : ''}`
              : event.actorName
                ? ` · ${event.actorName}`
                : ''}
          </p>
          {event.note && <p className="mt-1 whitespace-pre-wrap text-sm text-stone-800">{event.note}</p>}
          {office && event.documentId && (
            <button
              type="button"
              className="mt-1 text-sm font-semibold text-pine-700 underline"
              onClick={() => event.documentId && openDocument.mutate(event.documentId)}
            >
              Open the document
            </button>
          )}
        </li>
      ))}
      {openDocument.error && (
        <li>
          <ErrorNotice error={openDocument.error} />
        </li>
      )}
    </ol>
  );
}
