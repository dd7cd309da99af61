import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RequestEvent } from './types';

export const getEvents = (id: string) => api.get<{ events: RequestEvent[] }>(`/api/requests/${id}/events`);

export const getEventsQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['requests', id, 'events'], queryFn: () => getEvents(id) });

export const useEvents = (id: string) => useQuery(getEventsQueryOptions(id));
