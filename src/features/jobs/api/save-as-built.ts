import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SaveAsBuiltInput } from '@shared/crew/crew-inputs';
import type { AsBuiltSetView } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';
import { invalidateJob } from './invalidate-job';

export const saveAsBuilt = ({ id, ...body }: SaveAsBuiltInput & { id: string }) =>
  api.post<{ set: AsBuiltSetView }>(`/api/crew/jobs/${id}/as-built`, body);

export function useSaveAsBuilt() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: saveAsBuilt, onSuccess: (_d, v) => invalidateJob(queryClient, v.id) });
}
