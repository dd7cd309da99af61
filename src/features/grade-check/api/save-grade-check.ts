import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SavedInputs } from '../lib/build-inputs';
import { getGradeChecksQueryOptions, type SavedCheck } from './get-grade-checks';

/** Only the inputs travel: the server runs the engine itself and keeps its own result. */
export const saveGradeCheck = ({ requestId, ...body }: { requestId: string; ruleProfileVersionId: string; inputs: SavedInputs }) =>
  api.post<{ check: SavedCheck }>(`/api/requests/${requestId}/grade-checks`, body);

export function useSaveGradeCheck(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveGradeCheck,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getGradeChecksQueryOptions(requestId).queryKey }),
  });
}
