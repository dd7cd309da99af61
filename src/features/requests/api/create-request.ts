import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getMyRequestsQueryOptions } from './get-my-requests';
import type { RequestView } from '@shared/contracts/requests';

export const createRequest = () => api.post<{ request: RequestView }>('/api/requests', {});

export function useCreateRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRequest,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getMyRequestsQueryOptions().queryKey }),
  });
}
