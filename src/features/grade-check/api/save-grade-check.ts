import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { GradeCheckSavedView, SaveGradeCheckInput } from '@shared/contracts/grade-checks';
import { api } from '@/lib/api-client';
import { getGradeChecksQueryOptions } from './get-grade-checks';

/** Only the inputs travel: the server runs the engine itself and keeps its own result. */
export const saveGradeCheck = ({ requestId, ...body }: SaveGradeCheckInput & { requestId: string }) =>
  api.post<GradeCheckSavedView>(`/api/requests/${requestId}/grade-checks`, body);

export function useSaveGradeCheck(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveGradeCheck,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getGradeChecksQueryOptions(requestId).queryKey }),
  });
}
