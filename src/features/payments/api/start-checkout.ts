import { useMutation } from '@tanstack/react-query';
import type { CheckoutAnswer, StartCheckoutInput } from '@shared/contracts/payments';
import { api } from '@/lib/api-client';

export const startCheckout = (requestId: string, input: StartCheckoutInput) =>
  api.post<CheckoutAnswer>(`/api/requests/${requestId}/payments/checkout`, input);

/** Asks for the payment page of what is due and goes there; the owner comes back to the request page. */
export function useStartCheckout(requestId: string) {
  return useMutation({
    mutationFn: (input: StartCheckoutInput) => startCheckout(requestId, input),
    onSuccess: ({ url }) => window.location.assign(url),
  });
}
