import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getJurisdictionQueryOptions, type ProfileVersion } from './get-jurisdiction';

export const updateDraft = ({ versionId, ...body }: { versionId: string; profile: unknown; changeNote: string }) =>
  api.put<{ version: ProfileVersion }>(`/api/rule-profile-versions/${versionId}`, body);

export function useUpdateDraft(jurisdictionId: string) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateDraft, onSuccess: () => queryClient.invalidateQueries({ queryKey: getJurisdictionQueryOptions(jurisdictionId).queryKey }) });
}
