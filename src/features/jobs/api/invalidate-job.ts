import type { QueryClient } from '@tanstack/react-query';
import { photoKeys } from '@/lib/query-keys';
import { getAsBuiltQueryOptions } from './get-as-built';
import { getBoardQueryOptions } from './get-board';
import { getFieldSheetQueryOptions } from './get-field-sheet';
import { getMyJobsQueryOptions } from './get-my-jobs';

/** After any change to a job, every crew view that shows it reads it again. */
export async function invalidateJob(queryClient: QueryClient, id: string) {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: getBoardQueryOptions().queryKey.slice(0, 2) }),
    queryClient.invalidateQueries({ queryKey: getMyJobsQueryOptions().queryKey }),
    queryClient.invalidateQueries({ queryKey: getFieldSheetQueryOptions(id).queryKey }),
    queryClient.invalidateQueries({ queryKey: getAsBuiltQueryOptions(id).queryKey }),
    queryClient.invalidateQueries({ queryKey: photoKeys.crewOfRequest(id) }),
  ]);
}
