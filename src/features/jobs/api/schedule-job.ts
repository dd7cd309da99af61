import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invalidateJob } from './invalidate-job';

export const scheduleJob = ({ id, ...body }: { id: string; date: string; note?: string }) =>
  api.post<{ scheduledFor: string; previousDate: string | null }>(`/api/crew/jobs/${id}/schedule`, body);

export function useScheduleJob() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: scheduleJob, onSuccess: (_d, v) => invalidateJob(queryClient, v.id) });
}
