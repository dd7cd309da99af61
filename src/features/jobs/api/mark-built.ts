import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { markBuiltInputSchema } from '@shared/crew/crew-inputs';
import { api } from '@/lib/api-client';
import { invalidateJob } from './invalidate-job';

export const markBuilt = ({ id, ...body }: { id: string } & z.input<typeof markBuiltInputSchema>) =>
  api.post<{ request: { id: string; version: number } }>(`/api/crew/jobs/${id}/mark-built`, body);

export function useMarkBuilt() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: markBuilt, onSuccess: (_d, v) => invalidateJob(queryClient, v.id) });
}
