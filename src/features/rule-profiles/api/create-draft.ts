import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateVersionInput, ProfileVersion } from '@shared/contracts/rule-profiles';
import { api } from '@/lib/api-client';
import { ruleProfileKeys } from '@/lib/query-keys';

export const createDraft = ({ jurisdictionId, fromVersionId }: CreateVersionInput & { jurisdictionId: string }) =>
  api.post<{ version: ProfileVersion }>(`/api/jurisdictions/${jurisdictionId}/versions`, { fromVersionId });

export function useCreateDraft(jurisdictionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDraft,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ruleProfileKeys.one(jurisdictionId) }),
        queryClient.invalidateQueries({ queryKey: ruleProfileKeys.list() }),
      ]),
  });
}
