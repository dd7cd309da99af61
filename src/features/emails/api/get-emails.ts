import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const emailStatuses = ['queued', 'sending', 'sent', 'failed', 'dead'] as const;
export type EmailStatus = (typeof emailStatuses)[number];

export interface EmailRow {
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
  createdAt: string;
  sentAt: string | null;
  /** For a failed message: when it is tried next. */
  nextAttemptAt: string;
}

export interface EmailLogFilter { status?: EmailStatus; search?: string }
interface EmailLogPage { emails: EmailRow[]; nextCursor: string | null; totals: Record<EmailStatus, number> }

export const getEmails = (filter: EmailLogFilter, cursor?: string) =>
  api.get<EmailLogPage>('/api/emails', { status: filter.status, search: filter.search, cursor, limit: 50 });

export const getEmailsQueryOptions = (filter: EmailLogFilter = {}) => infiniteQueryOptions({
  queryKey: ['emails', filter],
  queryFn: ({ pageParam }) => getEmails(filter, pageParam || undefined),
  initialPageParam: '',
  getNextPageParam: (last) => last.nextCursor ?? undefined,
  // Delivery happens in the background: keep the log moving while it is open.
  refetchInterval: 10_000,
});

export const useEmails = (filter: EmailLogFilter) => useInfiniteQuery(getEmailsQueryOptions(filter));
