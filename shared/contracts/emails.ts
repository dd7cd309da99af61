import { z } from 'zod';
import type { Moment } from './wire';

export const emailStatuses = ['queued', 'sending', 'sent', 'failed', 'dead'] as const;
export type EmailStatus = (typeof emailStatuses)[number];

/**
 * GET /api/emails. The cursor is the text this list gave out; the server reads its position (and refuses one it
 * did not give) on top of this.
 */
export const listEmailsQuerySchema = z.object({
  status: z.enum(emailStatuses, { error: `must be one of: ${emailStatuses.join(', ')}` }).optional(),
  requestId: z.uuid('must be a valid id').optional(),
  search: z.string().trim().max(100, 'must be at most 100 characters').optional(),
  cursor: z.string().max(200).optional(),
  limit: z.coerce.number('must be a number').int('must be a whole number').min(1).max(200).default(50),
});
export interface EmailLogFilter {
  status?: EmailStatus;
  search?: string;
}

export interface EmailView<When extends Moment = string> {
  id: string;
  requestId: string | null;
  reference: string | null;
  template: string;
  toAddress: string;
  subject: string;
  status: EmailStatus;
  attempts: number;
  lastError: string | null;
  messageId: string | null;
  createdAt: When;
  sentAt: When | null;
  /** For a failed message: when it is tried next. */
  nextAttemptAt: When;
}

export interface EmailDetailView<When extends Moment = string> extends EmailView<When> {
  textBody: string;
  htmlBody: string;
}
export interface EmailLogPage<When extends Moment = string> {
  emails: EmailView<When>[];
  nextCursor: string | null;
  totals: Record<EmailStatus, number>;
}
