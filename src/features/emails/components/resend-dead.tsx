import { Button } from '@/components/ui/button';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { useRetryDeadEmails } from '../api/retry-dead-emails';

/**
 * After a long mail outage many messages may have given up at once: one button puts them all back in the queue.
 * Shown only while there is something to send again (or right after, to say what was done).
 */
export function ResendDead({ deadCount }: { deadCount: number }) {
  const resend = useRetryDeadEmails();
  if (deadCount === 0 && !resend.data) return null;
  return (
    <div className="space-y-2">
      {deadCount > 0 && (
        <Notice
          tone="warn"
          title={`${deadCount} ${deadCount === 1 ? 'message' : 'messages'} gave up: the mail server could not be reached for the whole retry period`}
        >
          <p>
            Once the mail server is working again, send them all again in one step. Each goes out once, with its
            original content.
          </p>
          <Button className="mt-2" onClick={() => resend.mutate()} disabled={resend.isPending}>
            {resend.isPending ? 'Queuing…' : `Send all ${deadCount} again`}
          </Button>
        </Notice>
      )}
      {resend.data && (
        <p role="status" className="text-sm text-pine-800">
          {resend.data.queued === 1 ? '1 message is' : `${resend.data.queued} messages are`} back in the queue.
        </p>
      )}
      {resend.error && <ErrorNotice error={resend.error} />}
    </div>
  );
}
