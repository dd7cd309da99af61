import { useMutation, useQueryClient } from '@tanstack/react-query';
import { queueKeys, statusChangeKeys } from '@/lib/query-keys';
import { runTransition } from '@/lib/status-change';
import { getGradeChecksQueryOptions } from './get-grade-checks';

/** The status change lives in the office workflow; this screen only offers the one step that follows a check. */
export const markChecked = ({ requestId, expectedVersion }: { requestId: string; expectedVersion: number }) =>
  runTransition(requestId, { action: 'mark-checked', expectedVersion });

export function useMarkChecked() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markChecked,
    // A status change shows on every screen that holds the request: the request and its history, the queue, and
    // the check screen's own header.
    onSuccess: (_answer, { requestId }) =>
      Promise.all(
        [...statusChangeKeys(requestId), queueKeys.all, getGradeChecksQueryOptions(requestId).queryKey].map(
          (queryKey) => queryClient.invalidateQueries({ queryKey }),
        ),
      ),
  });
}
