import { queryOptions, useQuery } from '@tanstack/react-query';
import type { QuotesAnswer } from '@shared/contracts/quotes';
import { api } from '@/lib/api-client';
import { quoteKeys } from '@/lib/query-keys';

export type { QuoteView, QuotesAnswer } from '@shared/contracts/quotes';

export const getQuotes = (requestId: string) => api.get<QuotesAnswer>(`/api/requests/${requestId}/quotes`);

export const getQuotesQueryOptions = (requestId: string) =>
  queryOptions({ queryKey: quoteKeys.ofRequest(requestId), queryFn: () => getQuotes(requestId) });

export const useQuotes = (requestId: string) => useQuery(getQuotesQueryOptions(requestId));

/** The PDF of one version, as it was sent (or as it would be, for a draft). Opened in a new tab, signed in. */
export const quotePdfHref = (quoteId: string) => `/api/quotes/${quoteId}/pdf`;
