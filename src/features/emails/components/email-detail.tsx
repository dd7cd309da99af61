import { formatMoment } from '@shared/format/dates';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useEmail } from '../api/get-email';
import { useRetryEmail } from '../api/retry-email';
import { EmailStatusBadge } from './email-status';

/** One message as it was (or will be) sent, with the last delivery error, and "Send again" for one that failed or gave up. */
export function EmailDetailPanel({ id }: { id: string }) {
  const email = useEmail(id);
  const retry = useRetryEmail();
  if (email.isPending) return <Loading />;
  if (email.error) return <ErrorNotice error={email.error} />;
  const e = email.data.email;
  return (
    <div className="space-y-3 text-sm">
      <div className="flex flex-wrap items-center gap-3">
        <EmailStatusBadge email={e} />
        {(e.status === 'dead' || e.status === 'failed') && (
          <Button onClick={() => retry.mutate(e.id)} disabled={retry.isPending}>
            {retry.isPending ? 'Queuing…' : 'Send again'}
          </Button>
        )}
      </div>
      {e.status === 'failed' && (
        <p className="text-stone-700">
          Tried {e.attempts} {e.attempts === 1 ? 'time' : 'times'} so far; the next try is due{' '}
          {formatMoment(e.nextAttemptAt)}.
        </p>
      )}
      {retry.error && <ErrorNotice error={retry.error} />}
      {e.lastError && (
        <div>
          <p className="font-semibold text-stone-700">Last error</p>
          <pre className="whitespace-pre-wrap rounded bg-red-50 p-2 font-mono text-xs text-red-900">{e.lastError}</pre>
        </div>
      )}
      <p className="text-xs text-stone-600">
        Message-ID {e.messageId ?? '(given when sent)'} · template {e.template}
      </p>
      <pre className="max-h-96 overflow-auto whitespace-pre-wrap rounded border border-stone-200 bg-paper p-3 font-sans">
        {e.textBody}
      </pre>
    </div>
  );
}
