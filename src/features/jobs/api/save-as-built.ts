import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SaveAsBuiltInput } from '@shared/crew/crew-inputs';
import type { AsBuiltSetView } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';
import { invalidateJob } from './invalidate-job';

/** `key` is the set's idempotency key: made when the set is entered and kept for every try, so it is stored once. */
export const saveAsBuilt = ({ id, key, ...body }: SaveAsBuiltInput & { id: string; key: string }) =>
  api.withHeaders({ 'Idempotency-Key': key }).post<{ set: AsBuiltSetView }>(`/api/crew/jobs/${id}/as-built`, body);

export function useSaveAsBuilt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveAsBuilt,
    // Tried even when the browser says it is offline: the failure is what sends the set to the phone's queue.
    networkMode: 'always',
    onSuccess: (_d, v) => invalidateJob(queryClient, v.id),
  });
}
