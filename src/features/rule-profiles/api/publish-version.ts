import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getJurisdictionQueryOptions, type ProfileVersion } from './get-jurisdiction';
import { getJurisdictionsQueryOptions } from './get-jurisdictions';

export const publishVersion = (versionId: string) => api.post<{ version: ProfileVersion }>(`/api/rule-profile-versions/${versionId}/publish`);

export function usePublishVersion(jurisdictionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: publishVersion,
    onSuccess: () => Promise.all([
      queryClient.invalidateQueries({ queryKey: getJurisdictionQueryOptions(jurisdictionId).queryKey }),
      queryClient.invalidateQueries({ queryKey: getJurisdictionsQueryOptions().queryKey, exact: true }),
    ]),
  });
}
