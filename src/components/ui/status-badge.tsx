import { statusText, terminalStatuses, waitingOnOffice, type RequestStatus } from '@shared/workflow/statuses';

export function StatusBadge({ status }: { status: RequestStatus }) {
  const tone = terminalStatuses.includes(status)
    ? 'bg-stone-100 text-stone-700 border-stone-300'
    : status === 'needs_details'
      ? 'bg-amber-50 text-amber-900 border-tape'
      : waitingOnOffice.includes(status)
        ? 'bg-pine-50 text-pine-800 border-pine-200'
        : 'bg-sky-50 text-sky-900 border-sky-200';
  return (
    <span className={`inline-block whitespace-nowrap rounded-full border px-2.5 py-0.5 text-xs font-semibold ${tone}`}>
      {statusText[status].label}
    </span>
  );
}
