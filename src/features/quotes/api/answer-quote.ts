import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcceptQuoteInput, DeclineQuoteInput, QuoteAnswer } from '@shared/contracts/quotes';
import { api } from '@/lib/api-client';
import { quoteChangeKeys } from '@/lib/query-keys';

export const acceptQuote = (quoteId: string, input: AcceptQuoteInput) =>
  api.post<QuoteAnswer>(`/api/quotes/${quoteId}/accept`, input);
export const declineQuote = (quoteId: string, input: DeclineQuoteInput) =>
  api.post<QuoteAnswer>(`/api/quotes/${quoteId}/decline`, input);

/** POST /api/quotes/:id/accept and /decline: the owner's two answers, which refresh the same things. */
export function useAnswerQuote(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (
      answer: { quoteId: string; accept: AcceptQuoteInput } | { quoteId: string; decline: DeclineQuoteInput },
    ) =>
      'accept' in answer ? acceptQuote(answer.quoteId, answer.accept) : declineQuote(answer.quoteId, answer.decline),
    onSuccess: () =>
      Promise.all(quoteChangeKeys(requestId).map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
