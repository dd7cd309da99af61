import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { YardInput } from '@shared/crew/crew-inputs';
import type { Yard } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';
import { auditKeys } from '@/lib/query-keys';
import { getBoardQueryOptions } from './get-board';
import { getYardQueryOptions } from './get-yard';

export const setYard = (input: YardInput) => api.put<{ yard: Yard }>('/api/crew/yard', input);

export function useSetYard() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setYard,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: getYardQueryOptions().queryKey });
      // Distances on the board are measured from the yard: every sort of it is stale now.
      await queryClient.invalidateQueries({ queryKey: getBoardQueryOptions().queryKey.slice(0, 2) });
      await queryClient.invalidateQueries({ queryKey: auditKeys.all });
    },
  });
}
