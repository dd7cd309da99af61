import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RefundInput, RequestPaymentsView } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';
import { eventKeys, paymentKeys } from '@/lib/query-keys';

export const refundPayment = (paymentId: string, input: RefundInput) =>
  api.post<RequestPaymentsView>(`/api/payments/${paymentId}/refund`, input);

export function useRefundPayment(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ paymentId, ...input }: RefundInput & { paymentId: string }) => refundPayment(paymentId, input),
    onSuccess: (view) => {
      queryClient.setQueryData(paymentKeys.ofRequest(requestId), view);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: eventKeys.ofRequest(requestId) }),
        queryClient.invalidateQueries({ queryKey: paymentKeys.lists() }),
      ]);
    },
  });
}
