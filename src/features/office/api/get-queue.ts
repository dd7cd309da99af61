import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queueKeys } from '@/lib/query-keys';
import type { QueueFilters, QueuePage } from './types';

export const defaultQueueFilters: QueueFilters = {
  status: [],
  jurisdiction: '',
  assignee: '',
  waiting: false,
  q: '',
  sort: 'waiting',
  dir: 'asc',
  cursor: '',
};

export const getQueue = (filters: QueueFilters) =>
  api.get<QueuePage>('/api/queue', {
    status: filters.status.join(','),
    jurisdiction: filters.jurisdiction,
    assignee: filters.assignee,
    waiting: filters.waiting ? 'true' : undefined,
    q: filters.q,
    sort: filters.sort,
    dir: filters.dir,
    cursor: filters.cursor,
    limit: 50,
  });

export const getQueueQueryOptions = (filters: QueueFilters = defaultQueueFilters) =>
  queryOptions({ queryKey: queueKeys.list(filters), queryFn: () => getQueue(filters), staleTime: 10_000 });

/** Every view of the queue at once, for invalidating after a change. */
export const allQueuesKey = () => queueKeys.all;

/** The previous page stays on screen while the next one loads, so the table does not jump. */
export const useQueue = (filters: QueueFilters) =>
  useQuery({ ...getQueueQueryOptions(filters), placeholderData: keepPreviousData });
