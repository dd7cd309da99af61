import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { requestKeys, statusChangeKeys } from '@/lib/query-keys';

/** The applicant's status changes: send, answer the office's question, withdraw. */
export type ApplicantAction = 'submit' | 'answer' | 'withdraw';

export interface TransitionCall { id: string; action: ApplicantAction; expectedVersion: number; answer?: string }

export const runTransition = ({ id, ...body }: TransitionCall) =>
  api.post<{ request: { id: string; status: string; version: number } }>(`/api/requests/${id}/transitions`, body);

export function useRunTransition(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (call: Omit<TransitionCall, 'id'>) => runTransition({ id, ...call }),
    onSuccess: () => Promise.all([...statusChangeKeys(id), requestKeys.mine()].map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
