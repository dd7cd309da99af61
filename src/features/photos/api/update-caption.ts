import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PhotoView } from '@shared/contracts/photos';
import { api } from '@/lib/api-client';
import { photoKeys } from '@/lib/query-keys';

export const updateCaption = ({
  requestId,
  photoId,
  caption,
}: {
  requestId: string;
  photoId: string;
  caption: string;
}) => api.patch<{ photo: PhotoView }>(`/api/requests/${requestId}/photos/${photoId}`, { caption });

export function useUpdateCaption(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: { photoId: string; caption: string }) => updateCaption({ requestId, ...change }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKeys.ofRequest(requestId) }),
  });
}
