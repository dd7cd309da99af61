import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InspectorLinkView } from '@shared/contracts/inspections';
import { api } from '@/lib/api-client';
import { eventKeys, inspectionKeys } from '@/lib/query-keys';

export const revokeInspectorLink = (requestId: string, linkId: string) =>
  api.post<{ link: InspectorLinkView }>(`/api/requests/${requestId}/inspector-links/${linkId}/revoke`);

export function useRevokeInspectorLink(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (linkId: string) => revokeInspectorLink(requestId, linkId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: inspectionKeys.ofRequest(requestId) }),
        queryClient.invalidateQueries({ queryKey: eventKeys.ofRequest(requestId) }),
      ]),
  });
}
