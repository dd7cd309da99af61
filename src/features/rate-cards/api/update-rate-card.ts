import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RateCardAnswer, UpdateRateCardInput } from '@shared/contracts/rate-cards';
import { api } from '@/lib/api-client';
import { rateCardKeys } from '@/lib/query-keys';

export const updateRateCard = (id: string, input: UpdateRateCardInput) =>
  api.put<RateCardAnswer>(`/api/rate-cards/${id}`, input);

export function useUpdateRateCard() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: string; input: UpdateRateCardInput }) => updateRateCard(id, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rateCardKeys.list() }),
  });
}
