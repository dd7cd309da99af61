import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProfileVersion } from '@shared/contracts/rule-profiles';
import { api } from '@/lib/api-client';
import { auditKeys, ruleProfileKeys } from '@/lib/query-keys';

export const publishVersion = (versionId: string) =>
  api.post<{ version: ProfileVersion }>(`/api/rule-profile-versions/${versionId}/publish`);

export function usePublishVersion(jurisdictionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: publishVersion,
    onSuccess: (_data, versionId) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ruleProfileKeys.one(jurisdictionId) }),
        queryClient.invalidateQueries({ queryKey: ruleProfileKeys.version(versionId) }),
        queryClient.invalidateQueries({ queryKey: ruleProfileKeys.list() }),
        queryClient.invalidateQueries({ queryKey: auditKeys.all }),
      ]),
  });
}
