import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SendInspectorLinkInput, SentInspectorLink } from '@shared/contracts/inspections';
import { api } from '@/lib/api-client';
import { eventKeys, inspectionKeys } from '@/lib/query-keys';

export const sendInspectorLink = (requestId: string, input: SendInspectorLinkInput) =>
  api.post<SentInspectorLink>(`/api/requests/${requestId}/inspector-links`, input);

export function useSendInspectorLink(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SendInspectorLinkInput) => sendInspectorLink(requestId, input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: inspectionKeys.ofRequest(requestId) }),
        queryClient.invalidateQueries({ queryKey: eventKeys.ofRequest(requestId) }),
      ]),
  });
}
