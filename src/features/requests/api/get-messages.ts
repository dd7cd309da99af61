import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RequestMessage } from './types';

export const getMessages = (id: string) => api.get<{ messages: RequestMessage[] }>(`/api/requests/${id}/messages`);

export const getMessagesQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['requests', id, 'messages'], queryFn: () => getMessages(id) });

export const useMessages = (id: string, enabled = true) => useQuery({ ...getMessagesQueryOptions(id), enabled });
