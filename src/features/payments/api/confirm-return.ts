import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CheckoutReturnInput, RequestPaymentsView } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';
import { eventKeys, paymentKeys } from '@/lib/query-keys';

export const confirmReturn = (requestId: string, input: CheckoutReturnInput) =>
  api.post<RequestPaymentsView>(`/api/requests/${requestId}/payments/return`, input);

/** Back from the payment page: the server asks the provider whether it was paid and records it. */
export function useConfirmReturn(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CheckoutReturnInput) => confirmReturn(requestId, input),
    onSuccess: (view) => {
      queryClient.setQueryData(paymentKeys.ofRequest(requestId), view);
      return queryClient.invalidateQueries({ queryKey: eventKeys.ofRequest(requestId) });
    },
  });
}
