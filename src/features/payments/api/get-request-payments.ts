import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RequestPaymentsView } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';
import { paymentKeys } from '@/lib/query-keys';

export const getRequestPayments = (requestId: string) =>
  api.get<RequestPaymentsView>(`/api/requests/${requestId}/payments`);

export const getRequestPaymentsQueryOptions = (requestId: string) =>
  queryOptions({ queryKey: paymentKeys.ofRequest(requestId), queryFn: () => getRequestPayments(requestId) });

export const useRequestPayments = (requestId: string) => useQuery(getRequestPaymentsQueryOptions(requestId));
