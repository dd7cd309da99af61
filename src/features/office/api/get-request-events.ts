import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OfficeEvent } from './types';

export const getRequestEvents = (id: string) => api.get<{ events: OfficeEvent[] }>(`/api/requests/${id}/events`);

export const getRequestEventsQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['office', 'events', id], queryFn: () => getRequestEvents(id) });

export const useRequestEvents = (id: string) => useQuery(getRequestEventsQueryOptions(id));
