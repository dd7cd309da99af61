import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RequestView, SaveDraftInput } from '@shared/contracts/requests';
import { api } from '@/lib/api-client';
import { getMyRequestsQueryOptions } from './get-my-requests';
import { getRequestQueryOptions } from './get-request';

export type DraftChange = SaveDraftInput & { id: string };

export const saveDraft = ({ id, ...change }: DraftChange) =>
  api.patch<{ request: RequestView }>(`/api/requests/${id}/draft`, change);

/** For the moment the page goes away: the browser finishes a keepalive request even after the tab closes. */
export function saveDraftOnExit({ id, ...change }: DraftChange) {
  void fetch(`/api/requests/${id}/draft`, {
    method: 'PATCH',
    keepalive: true,
    credentials: 'same-origin',
    headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
    body: JSON.stringify(change),
  }).catch(() => undefined);
}

export function useSaveDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveDraft,
    onSuccess: ({ request }) => {
      queryClient.setQueryData(getRequestQueryOptions(request.id).queryKey, (old) => (old ? { ...old, request } : old));
      return queryClient.invalidateQueries({ queryKey: getMyRequestsQueryOptions().queryKey, exact: true });
    },
  });
}
