import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AttachGradeCheckInput, GradeCheckAttachedView } from '@shared/contracts/grade-checks';
import { api } from '@/lib/api-client';
import { getDocumentsQueryOptions } from './get-documents';
import { getGradeChecksQueryOptions } from './get-grade-checks';

export const attachGradeCheck = ({ checkId, ...body }: AttachGradeCheckInput & { checkId: string }) =>
  api.post<GradeCheckAttachedView>(`/api/grade-checks/${checkId}/attach`, body);

export function useAttachGradeCheck(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: attachGradeCheck,
    onSuccess: () => Promise.all([
      queryClient.invalidateQueries({ queryKey: getGradeChecksQueryOptions(requestId).queryKey }),
      queryClient.invalidateQueries({ queryKey: getDocumentsQueryOptions(requestId).queryKey }),
    ]),
  });
}
