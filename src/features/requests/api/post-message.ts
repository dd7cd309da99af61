import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getMessagesQueryOptions } from './get-messages';
import type { RequestMessage } from './types';

export const postMessage = ({ id, body }: { id: string; body: string }) =>
  api.post<{ message: RequestMessage }>(`/api/requests/${id}/messages`, { body });

export function usePostMessage(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => postMessage({ id, body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getMessagesQueryOptions(id).queryKey }),
  });
}
