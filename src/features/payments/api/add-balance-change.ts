import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BalanceChangeInput, RequestPaymentsView } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';
import { eventKeys, paymentKeys } from '@/lib/query-keys';

export const addBalanceChange = (requestId: string, input: BalanceChangeInput) =>
  api.post<RequestPaymentsView>(`/api/requests/${requestId}/payments/changes`, input);

export function useAddBalanceChange(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BalanceChangeInput) => addBalanceChange(requestId, input),
    onSuccess: (view) => {
      queryClient.setQueryData(paymentKeys.ofRequest(requestId), view);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: eventKeys.ofRequest(requestId) }),
        queryClient.invalidateQueries({ queryKey: paymentKeys.lists() }),
      ]);
    },
  });
}
