import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MessagesAnswer } from '@shared/contracts/messages';
import { api } from '@/lib/api-client';
import { messageKeys } from '@/lib/query-keys';
import { keptForOffline } from '@/lib/react-query';

export const getMessages = (requestId: string) => api.get<MessagesAnswer>(`/api/requests/${requestId}/messages`);

export const getMessagesQueryOptions = (requestId: string) =>
  queryOptions({
    queryKey: messageKeys.ofRequest(requestId),
    queryFn: () => getMessages(requestId),
    ...keptForOffline,
  });

export const useMessages = (requestId: string) => useQuery(getMessagesQueryOptions(requestId));
