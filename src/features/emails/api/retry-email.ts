import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { EmailDetailView } from '@shared/contracts/emails';
import { emailKeys } from '@/lib/query-keys';

export const retryEmail = (id: string) => api.post<{ email: EmailDetailView }>(`/api/emails/${id}/retry`);

export function useRetryEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryEmail,
    onSettled: (_data, _error, id) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: emailKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: emailKeys.one(id) }),
      ]),
  });
}
