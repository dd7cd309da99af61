import type { DbOrTx } from '../../db/client';
import { emails, type EmailAttachment } from '../../db/schema';

export interface OutgoingEmail {
  to: string;
  template: string;
  subject: string;
  text: string;
  html: string;
  requestId?: string;
  eventId?: number;
  /** Files sent with it (a calendar invitation), stored on the row so a retry sends the same bytes. */
  attachments?: EmailAttachment[];
}

/**
 * Writes messages to the outbox. Call it inside the transaction that causes them: either the change and its
 * e-mails are both saved or neither is. Delivery happens later, in the background worker.
 */
export async function enqueueEmails(tx: DbOrTx, messages: OutgoingEmail[]) {
  if (messages.length === 0) return [];
  return tx
    .insert(emails)
    .values(
      messages.map((m) => ({
        toAddress: m.to,
        template: m.template,
        subject: m.subject,
        textBody: m.text,
        htmlBody: m.html,
        requestId: m.requestId,
        eventId: m.eventId,
        attachments: m.attachments ?? [],
      })),
    )
    .returning({ id: emails.id });
}
