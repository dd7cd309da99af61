import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PaymentListAnswer, PaymentListState } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';
import { paymentKeys } from '@/lib/query-keys';

export const getPayments = (state: PaymentListState) => api.get<PaymentListAnswer>('/api/payments', { state });

/** The address of the same list as a CSV file for the bookkeeper. */
export const paymentsCsvHref = (state: PaymentListState) => `/api/payments/export.csv?state=${state}`;

export const getPaymentsQueryOptions = (state: PaymentListState) =>
  queryOptions({ queryKey: paymentKeys.list(state), queryFn: () => getPayments(state) });

export const usePayments = (state: PaymentListState) => useQuery(getPaymentsQueryOptions(state));
