import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OfficeMessage } from './types';

export const getRequestMessages = (id: string) => api.get<{ messages: OfficeMessage[] }>(`/api/requests/${id}/messages`);

export const getRequestMessagesQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['office', 'messages', id], queryFn: () => getRequestMessages(id) });

export const useRequestMessages = (id: string) => useQuery(getRequestMessagesQueryOptions(id));
