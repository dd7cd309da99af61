import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PaymentWaits } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';
import { paymentKeys } from '@/lib/query-keys';

export const getPaymentWaits = () => api.get<PaymentWaits>('/api/settings/payment-waits');

export const getPaymentWaitsQueryOptions = () =>
  queryOptions({ queryKey: paymentKeys.waits(), queryFn: getPaymentWaits });

export const usePaymentWaits = () => useQuery(getPaymentWaitsQueryOptions());
