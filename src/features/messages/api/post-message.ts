import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PostMessageAnswer, PostMessageInput } from '@shared/contracts/messages';
import { api } from '@/lib/api-client';
import { messageKeys } from '@/lib/query-keys';

export const postMessage = (requestId: string, input: PostMessageInput) =>
  api.post<PostMessageAnswer>(`/api/requests/${requestId}/messages`, input);

export function usePostMessage(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PostMessageInput) => postMessage(requestId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: messageKeys.ofRequest(requestId) }),
  });
}
