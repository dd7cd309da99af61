import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getGradeChecksQueryOptions } from './get-grade-checks';

/** The status change lives in the office workflow; this screen only offers the one step that follows a check. */
export const markChecked = ({ requestId, expectedVersion }: { requestId: string; expectedVersion: number }) =>
  api.post<{ request: { id: string; status: string; version: number } }>(`/api/requests/${requestId}/transitions`, { action: 'mark-checked', expectedVersion });

export function useMarkChecked(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markChecked,
    // Other screens (queue, workspace) hold the request too; they refetch on their own next visit.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getGradeChecksQueryOptions(requestId).queryKey }),
  });
}
