import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getMyRequestsQueryOptions } from './get-my-requests';
import type { RequestDetail } from './types';

export const createRequest = () => api.post<{ request: RequestDetail }>('/api/requests', {});

export function useCreateRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRequest,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getMyRequestsQueryOptions().queryKey }),
  });
}
