import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getDocumentsQueryOptions } from './get-documents';
import type { GradeCheckView } from '@shared/contracts/grade-checks';
import { getGradeChecksQueryOptions } from './get-grade-checks';

export const withdrawGradeCheck = (checkId: string) =>
  api.post<{ check: GradeCheckView }>(`/api/grade-checks/${checkId}/withdraw`, {});

export function useWithdrawGradeCheck(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: withdrawGradeCheck,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: getGradeChecksQueryOptions(requestId).queryKey }),
        queryClient.invalidateQueries({ queryKey: getDocumentsQueryOptions(requestId).queryKey }),
      ]),
  });
}
