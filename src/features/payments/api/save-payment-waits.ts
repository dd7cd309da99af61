import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PaymentWaits } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';
import { paymentKeys } from '@/lib/query-keys';

export const savePaymentWaits = (input: PaymentWaits) => api.put<PaymentWaits>('/api/settings/payment-waits', input);

export function useSavePaymentWaits() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: savePaymentWaits,
    onSuccess: (saved) => {
      queryClient.setQueryData(paymentKeys.waits(), saved);
      // Every request's "waits for" lines follow the setting.
      return queryClient.invalidateQueries({ queryKey: paymentKeys.requests() });
    },
  });
}
