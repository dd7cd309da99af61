import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateJurisdictionInput } from '@shared/contracts/rule-profiles';
import { api } from '@/lib/api-client';
import { ruleProfileKeys } from '@/lib/query-keys';

export const createJurisdiction = (input: CreateJurisdictionInput) =>
  api.post<{ jurisdiction: { id: string }; draftId: string }>('/api/jurisdictions', input);

export function useCreateJurisdiction() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createJurisdiction,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ruleProfileKeys.list() }),
  });
}
