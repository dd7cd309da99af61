import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys } from '@/lib/query-keys';

export const removePhoto = ({ requestId, photoId }: { requestId: string; photoId: string }) =>
  api.delete<void>(`/api/requests/${requestId}/photos/${photoId}`);

export function useRemovePhoto(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) => removePhoto({ requestId, photoId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKeys.ofRequest(requestId) }),
  });
}
