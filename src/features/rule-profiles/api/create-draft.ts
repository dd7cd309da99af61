import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getJurisdictionQueryOptions, type ProfileVersion } from './get-jurisdiction';
import { getJurisdictionsQueryOptions } from './get-jurisdictions';

export const createDraft = ({ jurisdictionId, fromVersionId }: { jurisdictionId: string; fromVersionId?: string }) =>
  api.post<{ version: ProfileVersion }>(`/api/jurisdictions/${jurisdictionId}/versions`, { fromVersionId });

export function useCreateDraft(jurisdictionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDraft,
    onSuccess: () => Promise.all([
      queryClient.invalidateQueries({ queryKey: getJurisdictionQueryOptions(jurisdictionId).queryKey }),
      queryClient.invalidateQueries({ queryKey: getJurisdictionsQueryOptions().queryKey, exact: true }),
    ]),
  });
}
