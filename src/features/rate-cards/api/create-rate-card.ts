import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RateCardAnswer } from '@shared/contracts/rate-cards';
import { api } from '@/lib/api-client';
import { rateCardKeys } from '@/lib/query-keys';

export const createRateCard = (fromVersionId?: string) =>
  api.post<RateCardAnswer>('/api/rate-cards', fromVersionId ? { fromVersionId } : {});

export function useCreateRateCard() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRateCard,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rateCardKeys.list() }),
  });
}
