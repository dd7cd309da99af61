import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OfflinePaymentInput, RequestPaymentsView } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';
import { eventKeys, paymentKeys } from '@/lib/query-keys';

export const recordOfflinePayment = (requestId: string, input: OfflinePaymentInput) =>
  api.post<RequestPaymentsView>(`/api/requests/${requestId}/payments/offline`, input);

export function useRecordOfflinePayment(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OfflinePaymentInput) => recordOfflinePayment(requestId, input),
    onSuccess: (view) => {
      queryClient.setQueryData(paymentKeys.ofRequest(requestId), view);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: eventKeys.ofRequest(requestId) }),
        queryClient.invalidateQueries({ queryKey: paymentKeys.lists() }),
      ]);
    },
  });
}
