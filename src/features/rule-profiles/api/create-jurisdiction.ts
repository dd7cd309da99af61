import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getJurisdictionsQueryOptions } from './get-jurisdictions';

export const createJurisdiction = (input: { name: string; authority: string }) =>
  api.post<{ jurisdiction: { id: string }; draftId: string }>('/api/jurisdictions', input);

export function useCreateJurisdiction() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createJurisdiction, onSuccess: () => queryClient.invalidateQueries({ queryKey: getJurisdictionsQueryOptions().queryKey }) });
}
