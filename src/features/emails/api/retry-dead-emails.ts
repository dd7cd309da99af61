import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { emailKeys } from '@/lib/query-keys';

/** Every message that gave up goes back to the queue; the answer says how many. */
export const retryDeadEmails = () => api.post<{ queued: number }>('/api/emails/retry-dead');

export function useRetryDeadEmails() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryDeadEmails,
    onSettled: () => queryClient.invalidateQueries({ queryKey: emailKeys.lists() }),
  });
}
