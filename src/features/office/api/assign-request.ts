import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { eventKeys, requestKeys } from '@/lib/query-keys';
import { allQueuesKey } from './get-queue';

export const assignRequest = (id: string, assigneeId: string | null) =>
  api.put<{ request: { id: string; assigneeId: string | null } }>(`/api/requests/${id}/assignee`, { assigneeId });

export function useAssignRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, assigneeId }: { id: string; assigneeId: string | null }) => assignRequest(id, assigneeId),
    onSuccess: (_data, { id }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: allQueuesKey() }),
        queryClient.invalidateQueries({ queryKey: requestKeys.one(id) }),
        queryClient.invalidateQueries({ queryKey: eventKeys.ofRequest(id) }),
      ]),
  });
}
