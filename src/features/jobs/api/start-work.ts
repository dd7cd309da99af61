import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invalidateJob } from './invalidate-job';

export const startWork = ({ id, expectedVersion }: { id: string; expectedVersion: number }) =>
  api.post<{ request: { id: string; version: number } }>(`/api/crew/jobs/${id}/start`, { expectedVersion });

export function useStartWork() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: startWork, onSuccess: (_d, v) => invalidateJob(queryClient, v.id) });
}
