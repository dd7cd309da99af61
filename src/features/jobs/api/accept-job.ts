import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invalidateJob } from './invalidate-job';

export const acceptJob = ({ id, expectedVersion }: { id: string; expectedVersion: number }) =>
  api.post<{ request: { id: string; version: number } }>(`/api/crew/jobs/${id}/accept`, { expectedVersion });

export function useAcceptJob() {
  const queryClient = useQueryClient();
  // A lost race (409) also changes the board: the job is gone from it either way.
  return useMutation({ mutationFn: acceptJob, onSettled: (_d, _e, v) => invalidateJob(queryClient, v.id) });
}
