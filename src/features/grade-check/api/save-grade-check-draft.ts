import { useMutation } from '@tanstack/react-query';
import type { GradeCheckDraftAnswer, SaveGradeCheckDraftInput } from '@shared/contracts/grade-checks';
import { api } from '@/lib/api-client';

/** The survey as typed, kept on the server; the screen never reads it back while it is open. */
export const saveGradeCheckDraft = ({ requestId, ...body }: SaveGradeCheckDraftInput & { requestId: string }) =>
  api.put<GradeCheckDraftAnswer>(`/api/requests/${requestId}/grade-check-draft`, body);

export const useSaveGradeCheckDraft = () => useMutation({ mutationFn: saveGradeCheckDraft });
