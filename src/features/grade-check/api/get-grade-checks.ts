import { queryOptions, useQuery } from '@tanstack/react-query';
import type { GradeCheckListView } from '@shared/contracts/grade-checks';
import { api } from '@/lib/api-client';

export const getGradeChecks = (requestId: string) =>
  api.get<GradeCheckListView>(`/api/requests/${requestId}/grade-checks`);

export const getGradeChecksQueryOptions = (requestId: string) =>
  queryOptions({ queryKey: ['grade-checks', requestId], queryFn: () => getGradeChecks(requestId) });

export const useGradeChecks = (requestId: string) => useQuery(getGradeChecksQueryOptions(requestId));
