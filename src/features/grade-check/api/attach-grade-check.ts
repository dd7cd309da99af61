import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getDocumentsQueryOptions } from './get-documents';
import { getGradeChecksQueryOptions, type SavedCheck } from './get-grade-checks';

export const attachGradeCheck = ({ checkId, shareWithApplicant }: { checkId: string; shareWithApplicant: boolean }) =>
  api.post<{ check: SavedCheck; documentId: string }>(`/api/grade-checks/${checkId}/attach`, { shareWithApplicant });

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
