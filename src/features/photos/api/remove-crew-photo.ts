import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys } from '@/lib/query-keys';

export const removeCrewPhoto = ({ requestId, photoId }: { requestId: string; photoId: string }) =>
  api.delete<void>(`/api/crew/jobs/${requestId}/photos/${photoId}`);

export function useRemoveCrewPhoto(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) => removeCrewPhoto({ requestId, photoId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKeys.crewOfRequest(requestId) }),
  });
}
