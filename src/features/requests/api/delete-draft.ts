import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { requestKeys } from '@/lib/query-keys';

/** DELETE /api/requests/:id: a request its owner never sent. */
export const deleteDraft = (requestId: string) => api.delete<{ deleted: true }>(`/api/requests/${requestId}`);

export function useDeleteDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDraft,
    onSuccess: (_, requestId) => {
      queryClient.removeQueries({ queryKey: requestKeys.one(requestId) });
      return queryClient.invalidateQueries({ queryKey: requestKeys.mine() });
    },
  });
}
