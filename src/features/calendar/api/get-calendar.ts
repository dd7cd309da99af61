import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { CalendarAnswer } from '@shared/contracts/calendar';
import { api } from '@/lib/api-client';
import { calendarKeys } from '@/lib/query-keys';

export const getCalendar = (from: string, to: string) => api.get<CalendarAnswer>('/api/calendar', { from, to });

export const getCalendarQueryOptions = (from: string, to: string) =>
  queryOptions({
    queryKey: calendarKeys.range(from, to),
    queryFn: () => getCalendar(from, to),
    placeholderData: keepPreviousData,
  });

export const useCalendar = (from: string, to: string) => useQuery(getCalendarQueryOptions(from, to));
