import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateQuoteInput, QuoteAnswer } from '@shared/contracts/quotes';
import { api } from '@/lib/api-client';
import { quoteChangeKeys } from '@/lib/query-keys';

export const createQuote = (requestId: string, input: CreateQuoteInput) =>
  api.post<QuoteAnswer>(`/api/requests/${requestId}/quotes`, input);

export function useCreateQuote(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateQuoteInput) => createQuote(requestId, input),
    onSuccess: () =>
      Promise.all(quoteChangeKeys(requestId).map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
