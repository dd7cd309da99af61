import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** The status change lives in the office workflow; this screen only offers the one step that follows a check. */
export const markChecked = ({ requestId, expectedVersion }: { requestId: string; expectedVersion: number }) =>
  api.post<{ request: { id: string; status: string; version: number } }>(`/api/requests/${requestId}/transitions`, { action: 'mark-checked', expectedVersion });

export function useMarkChecked() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markChecked,
    // A status change shows on every screen that holds the request (queue, workspace, timeline), and those belong to
    // other features whose query keys this one does not know: everything cached is refreshed.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
