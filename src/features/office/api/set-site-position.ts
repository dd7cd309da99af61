import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OfficeRequestView, SitePositionInput } from '@shared/contracts/requests';
import { api } from '@/lib/api-client';
import { eventKeys, requestKeys } from '@/lib/query-keys';

/** PUT /api/requests/:id/site-position */
export const setSitePosition = ({ id, ...body }: SitePositionInput & { id: string }) =>
  api.put<{ request: OfficeRequestView }>(`/api/requests/${id}/site-position`, body);

export function useSetSitePosition() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setSitePosition,
    onSuccess: (_data, { id }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: requestKeys.one(id) }),
        queryClient.invalidateQueries({ queryKey: eventKeys.ofRequest(id) }),
      ]),
  });
}
