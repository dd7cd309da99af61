import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { QuoteAnswer, UpdateQuoteInput } from '@shared/contracts/quotes';
import { api } from '@/lib/api-client';
import { quoteKeys } from '@/lib/query-keys';

export const updateQuote = (quoteId: string, input: UpdateQuoteInput) =>
  api.put<QuoteAnswer>(`/api/quotes/${quoteId}`, input);

export function useUpdateQuote(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ quoteId, input }: { quoteId: string; input: UpdateQuoteInput }) => updateQuote(quoteId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quoteKeys.ofRequest(requestId) }),
  });
}
