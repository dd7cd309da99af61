import { eq, sql } from 'drizzle-orm';
import type { AppContext } from '../context';
import { emails } from '../db/schema';

export type DeliveryOutcome = 'sent' | 'skipped' | 'failed' | 'dead';

/** The sender's domain names our Message-IDs, so they read as ours in any mail client. */
export function messageIdFor(emailId: string, mailFrom: string) {
  const domain = /@([^>\s]+)/.exec(mailFrom)?.[1] ?? 'gradepass.invalid';
  return `<${emailId}@${domain}>`;
}

/**
 * Sends one outbox row. The row stays locked for the whole SMTP exchange, so two workers (or two jobs for the same
 * row) can never send it at the same time; a row already sent is left alone. The Message-ID is the row's id, so
 * if the process dies after the server accepted the message but before "sent" was saved, the resend carries the
 * same id and the receiving side can recognise it.
 */
export async function deliverEmail(ctx: AppContext, emailId: string, opts: { finalAttempt: boolean }): Promise<DeliveryOutcome> {
  return ctx.db.transaction(async (tx) => {
    const [row] = await tx.select().from(emails).where(eq(emails.id, emailId)).for('update', { skipLocked: true });
    if (!row || row.status === 'sent' || row.status === 'dead') return 'skipped';
    const messageId = messageIdFor(row.id, ctx.env.MAIL_FROM);
    try {
      await ctx.mailer.sendMail({
        from: ctx.env.MAIL_FROM,
        replyTo: ctx.env.MAIL_REPLY_TO,
        to: row.toAddress,
        subject: row.subject,
        text: row.textBody,
        html: row.htmlBody,
        messageId,
        headers: { 'X-Gradepass-Email-Id': row.id },
      });
    } catch (error) {
      const status = opts.finalAttempt ? 'dead' : 'failed';
      await tx.update(emails).set({
        status, attempts: sql`${emails.attempts} + 1`, lastError: describe(error),
      }).where(eq(emails.id, row.id));
      return status;
    }
    await tx.update(emails).set({
      status: 'sent', attempts: sql`${emails.attempts} + 1`, sentAt: new Date(), messageId, lastError: null,
    }).where(eq(emails.id, row.id));
    return 'sent';
  });
}

function describe(error: unknown): string {
  if (!(error instanceof Error)) return String(error).slice(0, 2000);
  const code = (error as { code?: string; responseCode?: number }).code;
  const response = (error as { response?: string }).response;
  return [code, error.message, response].filter(Boolean).join(': ').slice(0, 2000);
}
