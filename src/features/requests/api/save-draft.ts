import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RequestView, SaveDraftInput } from '@shared/contracts/requests';
import { api } from '@/lib/api-client';
import { getMyRequestsQueryOptions } from './get-my-requests';
import { getRequestQueryOptions } from './get-request';

export type DraftChange = SaveDraftInput & { id: string };

export const saveDraft = ({ id, ...change }: DraftChange) =>
  api.patch<{ request: RequestView }>(`/api/requests/${id}/draft`, change);

const exitCopyKey = (id: string) => `gradepass:unsaved-answers:${id}`;

/**
 * For the moment the page goes away: the browser finishes a keepalive request even after the tab closes. A copy
 * stays in the tab's own storage too, since a keepalive request can still be dropped (a page under a service worker
 * reloading is one case); the wizard sends that copy when it opens again in this tab (`sendExitCopy`).
 */
export function saveDraftOnExit({ id, ...change }: DraftChange) {
  try {
    sessionStorage.setItem(exitCopyKey(id), JSON.stringify(change));
  } catch {
    // Storage full or turned off: the keepalive request is still on its way.
  }
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

/**
 * Sends the answers a closing page kept in this tab, once, and says whether there were any. When the closing
 * page's own request did land, the version has moved on and this copy is refused as out of date: nothing is lost.
 */
export async function sendExitCopy(id: string): Promise<boolean> {
  let kept: string | null = null;
  try {
    kept = sessionStorage.getItem(exitCopyKey(id));
    sessionStorage.removeItem(exitCopyKey(id));
  } catch {
    return false;
  }
  if (!kept) return false;
  try {
    await saveDraft({ id, ...(JSON.parse(kept) as SaveDraftInput) });
  } catch {
    // Already saved by the closing page (409), or no longer a draft: what the server has stands.
  }
  return true;
}
