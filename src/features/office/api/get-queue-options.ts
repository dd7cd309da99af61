import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { QueueOptions } from './types';

export const getQueueOptions = () => api.get<QueueOptions>('/api/queue/options');

export const getQueueOptionsQueryOptions = () =>
  queryOptions({ queryKey: ['office', 'queue-options'], queryFn: getQueueOptions, staleTime: 5 * 60_000 });

export const useQueueOptions = () => useQuery(getQueueOptionsQueryOptions());
