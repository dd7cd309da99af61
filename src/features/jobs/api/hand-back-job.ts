import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { handBackInputSchema } from '@shared/crew/crew-inputs';
import { api } from '@/lib/api-client';
import { invalidateJob } from './invalidate-job';

export const handBackJob = ({ id, ...body }: { id: string } & z.input<typeof handBackInputSchema>) =>
  api.post<{ request: { id: string; version: number } }>(`/api/crew/jobs/${id}/hand-back`, body);

export function useHandBackJob() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: handBackJob, onSuccess: (_d, v) => invalidateJob(queryClient, v.id) });
}
