import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getPhotosQueryOptions } from './get-photos';

export const updateCaption = ({ requestId, photoId, caption }: { requestId: string; photoId: string; caption: string }) =>
  api.patch<{ photo: { id: string; caption: string } }>(`/api/requests/${requestId}/photos/${photoId}`, { caption });

export function useUpdateCaption(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: { photoId: string; caption: string }) => updateCaption({ requestId, ...change }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getPhotosQueryOptions(requestId).queryKey }),
  });
}
