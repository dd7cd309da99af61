import { useMutation } from '@tanstack/react-query';
import type { GradeCheckDraftAnswer } from '@shared/contracts/grade-checks';
import { api } from '@/lib/api-client';

export const discardGradeCheckDraft = (requestId: string) =>
  api.delete<GradeCheckDraftAnswer>(`/api/requests/${requestId}/grade-check-draft`);

export const useDiscardGradeCheckDraft = () => useMutation({ mutationFn: discardGradeCheckDraft });
