import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TransitionBody } from '@shared/workflow/transition-inputs';
import { api } from '@/lib/api-client';
import { statusChangeKeys } from '@/lib/query-keys';
import { allQueuesKey } from './get-queue';

/** The body of any status change, as the shared input schemas define it. */
export type TransitionInput = TransitionBody;

export const runOfficeTransition = (id: string, input: TransitionInput) =>
  api.post<{ request: { id: string; status: string; version: number } }>(`/api/requests/${id}/transitions`, input);

export function useRunOfficeTransition(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: TransitionInput) => runOfficeTransition(id, input),
    // A 409 means someone else moved the request: refresh either way so the screen shows where it stands.
    onSettled: () => Promise.all([...statusChangeKeys(id), allQueuesKey()].map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
