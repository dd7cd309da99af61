import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getEmailQueryOptions, type EmailDetail } from './get-email';
import { getEmailsQueryOptions } from './get-emails';

export const retryEmail = (id: string) => api.post<{ email: EmailDetail }>(`/api/emails/${id}/retry`);

export function useRetryEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryEmail,
    onSettled: (_data, _error, id) => Promise.all([
      queryClient.invalidateQueries({ queryKey: getEmailsQueryOptions().queryKey.slice(0, 1) }),
      queryClient.invalidateQueries({ queryKey: getEmailQueryOptions(id).queryKey }),
    ]),
  });
}
