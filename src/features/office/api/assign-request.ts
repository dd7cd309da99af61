import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getOfficeRequestQueryOptions } from './get-office-request';
import { allQueuesKey } from './get-queue';
import { getRequestEventsQueryOptions } from './get-request-events';

export const assignRequest = (id: string, assigneeId: string | null) =>
  api.put<{ request: { id: string; assigneeId: string | null } }>(`/api/requests/${id}/assignee`, { assigneeId });

export function useAssignRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, assigneeId }: { id: string; assigneeId: string | null }) => assignRequest(id, assigneeId),
    onSuccess: (_data, { id }) => Promise.all([
      queryClient.invalidateQueries({ queryKey: allQueuesKey() }),
      queryClient.invalidateQueries({ queryKey: getOfficeRequestQueryOptions(id).queryKey }),
      queryClient.invalidateQueries({ queryKey: getRequestEventsQueryOptions(id).queryKey }),
    ]),
  });
}
