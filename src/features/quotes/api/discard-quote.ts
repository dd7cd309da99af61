import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { quoteKeys } from '@/lib/query-keys';

export const discardQuote = (quoteId: string) => api.delete<void>(`/api/quotes/${quoteId}`);

export function useDiscardQuote(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: discardQuote,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quoteKeys.ofRequest(requestId) }),
  });
}
