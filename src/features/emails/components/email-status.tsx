import type { EmailRow, EmailStatus } from '../api/get-emails';

export const emailStatusText: Record<EmailStatus, string> = {
  queued: 'Waiting to send',
  sending: 'Sending',
  sent: 'Sent',
  failed: 'Failed, will retry',
  dead: 'Gave up',
};

const tones: Record<EmailStatus, string> = {
  queued: 'border-stone-300 bg-stone-50 text-stone-700',
  sending: 'border-sky-200 bg-sky-50 text-sky-900',
  sent: 'border-pine-200 bg-pine-50 text-pine-800',
  failed: 'border-tape bg-amber-50 text-amber-900',
  dead: 'border-clay/40 bg-red-50 text-red-900',
};

/** The status, and "retried" whenever it took more than one attempt, so a flaky server shows up in the log. */
export function EmailStatusBadge({ email }: { email: Pick<EmailRow, 'status' | 'attempts'> }) {
  return (
    <span className="inline-flex flex-wrap items-center gap-1">
      <span
        className={`whitespace-nowrap rounded-full border px-2 py-0.5 text-xs font-semibold ${tones[email.status]}`}
      >
        {emailStatusText[email.status]}
      </span>
      {email.attempts > 1 && <span className="text-xs text-stone-600">retried, {email.attempts} attempts</span>}
    </span>
  );
}
