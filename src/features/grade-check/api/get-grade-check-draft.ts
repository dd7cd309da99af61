import { queryOptions, useQuery } from '@tanstack/react-query';
import type { GradeCheckDraftAnswer } from '@shared/contracts/grade-checks';
import { api } from '@/lib/api-client';
import { gradeCheckKeys } from '@/lib/query-keys';

export const getGradeCheckDraft = (requestId: string) =>
  api.get<GradeCheckDraftAnswer>(`/api/requests/${requestId}/grade-check-draft`);

// Read once when the screen opens: the form owns the survey from then on, so a refetch must not overwrite typing.
export const getGradeCheckDraftQueryOptions = (requestId: string) =>
  queryOptions({
    queryKey: gradeCheckKeys.draft(requestId),
    queryFn: () => getGradeCheckDraft(requestId),
    staleTime: Infinity,
    gcTime: 0,
    refetchOnWindowFocus: false,
  });

export const useGradeCheckDraft = (requestId: string) => useQuery(getGradeCheckDraftQueryOptions(requestId));
