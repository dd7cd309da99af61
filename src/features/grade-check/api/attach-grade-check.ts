import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AttachGradeCheckInput, GradeCheckAttachedView } from '@shared/contracts/grade-checks';
import { api } from '@/lib/api-client';
import { getDocumentsQueryOptions } from './get-documents';
import { getGradeChecksQueryOptions } from './get-grade-checks';

/** `confirmFailing` is the office's yes to attaching a check that does not meet the rules; the server asks for it. */
export const attachGradeCheck = ({ checkId, ...body }: AttachGradeCheckInput & { checkId: string }) =>
  api.post<GradeCheckAttachedView>(`/api/grade-checks/${checkId}/attach`, body);

export function useAttachGradeCheck(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: attachGradeCheck,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: getGradeChecksQueryOptions(requestId).queryKey }),
        queryClient.invalidateQueries({ queryKey: getDocumentsQueryOptions(requestId).queryKey }),
      ]),
  });
}
