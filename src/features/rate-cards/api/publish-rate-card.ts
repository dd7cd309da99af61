import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RateCardAnswer } from '@shared/contracts/rate-cards';
import { api } from '@/lib/api-client';
import { rateCardKeys } from '@/lib/query-keys';

export const publishRateCard = (id: string) => api.post<RateCardAnswer>(`/api/rate-cards/${id}/publish`);

export function usePublishRateCard() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: publishRateCard,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rateCardKeys.list() }),
  });
}
