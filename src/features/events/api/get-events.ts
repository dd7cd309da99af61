import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventsAnswer } from '@shared/contracts/events';
import { api } from '@/lib/api-client';
import { eventKeys } from '@/lib/query-keys';

export const getEvents = (requestId: string) => api.get<EventsAnswer>(`/api/requests/${requestId}/events`);

export const getEventsQueryOptions = (requestId: string) =>
  queryOptions({ queryKey: eventKeys.ofRequest(requestId), queryFn: () => getEvents(requestId) });

export const useEvents = (requestId: string) => useQuery(getEventsQueryOptions(requestId));

/** The office's latest question to the owner: the note on the newest move to "needs details". */
export function useLatestQuestion(requestId: string, enabled: boolean) {
  const events = useQuery({ ...getEventsQueryOptions(requestId), enabled }).data?.events ?? [];
  return [...events].reverse().find((e) => e.toStatus === 'needs_details')?.note;
}
