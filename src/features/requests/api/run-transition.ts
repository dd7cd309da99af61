import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getEventsQueryOptions } from './get-events';
import { getMessagesQueryOptions } from './get-messages';
import { getMyRequestsQueryOptions } from './get-my-requests';
import { getRequestQueryOptions } from './get-request';

/** The applicant's status changes: send, answer the office's question, withdraw. */
export type ApplicantAction = 'submit' | 'answer' | 'withdraw';

export interface TransitionCall { id: string; action: ApplicantAction; expectedVersion: number; answer?: string }

export const runTransition = ({ id, ...body }: TransitionCall) =>
  api.post<{ request: { id: string; status: string; version: number } }>(`/api/requests/${id}/transitions`, body);

export function useRunTransition(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (call: Omit<TransitionCall, 'id'>) => runTransition({ id, ...call }),
    onSuccess: () => Promise.all([
      queryClient.invalidateQueries({ queryKey: getRequestQueryOptions(id).queryKey }),
      queryClient.invalidateQueries({ queryKey: getEventsQueryOptions(id).queryKey }),
      queryClient.invalidateQueries({ queryKey: getMessagesQueryOptions(id).queryKey }),
      queryClient.invalidateQueries({ queryKey: getMyRequestsQueryOptions().queryKey }),
    ]),
  });
}
