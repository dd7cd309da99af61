import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { QuoteAnswer } from '@shared/contracts/quotes';
import { api } from '@/lib/api-client';
import { quoteChangeKeys } from '@/lib/query-keys';

export const sendQuote = (quoteId: string) => api.post<QuoteAnswer>(`/api/quotes/${quoteId}/send`);

export function useSendQuote(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendQuote,
    onSuccess: () =>
      Promise.all(quoteChangeKeys(requestId).map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
