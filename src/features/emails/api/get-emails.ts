import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import type { EmailLogFilter, EmailLogPage } from '@shared/contracts/emails';
import { api } from '@/lib/api-client';
import { emailKeys } from '@/lib/query-keys';

export {
  emailStatuses,
  type EmailLogFilter,
  type EmailStatus,
  type EmailView as EmailRow,
} from '@shared/contracts/emails';

export const getEmails = (filter: EmailLogFilter, cursor?: string) =>
  api.get<EmailLogPage>('/api/emails', { status: filter.status, search: filter.search, cursor, limit: 50 });

export const getEmailsQueryOptions = (filter: EmailLogFilter = {}) =>
  infiniteQueryOptions({
    queryKey: emailKeys.list(filter),
    queryFn: ({ pageParam }) => getEmails(filter, pageParam || undefined),
    initialPageParam: '',
    getNextPageParam: (last) => last.nextCursor ?? undefined,
    // Delivery happens in the background: keep the log moving while it is open.
    refetchInterval: 10_000,
  });

export const useEmails = (filter: EmailLogFilter) => useInfiniteQuery(getEmailsQueryOptions(filter));
