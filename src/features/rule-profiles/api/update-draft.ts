import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProfileVersion } from '@shared/contracts/rule-profiles';
import { api } from '@/lib/api-client';
import { ruleProfileKeys } from '@/lib/query-keys';

/** The profile goes as the form holds it; the server's rule profile schema names any field it refuses. */
export const updateDraft = ({ versionId, ...body }: { versionId: string; profile: unknown; changeNote: string }) =>
  api.put<{ version: ProfileVersion }>(`/api/rule-profile-versions/${versionId}`, body);

export function useUpdateDraft(jurisdictionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateDraft,
    onSuccess: (_data, { versionId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ruleProfileKeys.one(jurisdictionId) }),
        queryClient.invalidateQueries({ queryKey: ruleProfileKeys.version(versionId) }),
      ]),
  });
}
