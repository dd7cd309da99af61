import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TransitionBody } from '@shared/workflow/transition-inputs';
import { api } from '@/lib/api-client';
import { queueKeys, requestKeys, statusChangeKeys } from '@/lib/query-keys';

/**
 * Every status change from every screen, the owner's, the office's and the crew's alike: one endpoint, one body
 * (the shared input schemas' union keyed by action).
 */
export const runTransition = (id: string, body: TransitionBody) =>
  api.post<{ request: { id: string; status: string; version: number } }>(`/api/requests/${id}/transitions`, body);

export function useRunTransition(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: TransitionBody) => runTransition(id, body),
    // A 409 means someone else moved the request: refresh either way so every screen shows where it stands.
    onSettled: () =>
      Promise.all(
        [...statusChangeKeys(id), requestKeys.mine(), queueKeys.all].map((queryKey) =>
          queryClient.invalidateQueries({ queryKey }),
        ),
      ),
  });
}
