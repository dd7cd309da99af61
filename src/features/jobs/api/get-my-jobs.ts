import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MyJob } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';
import { keptForOffline } from '@/lib/react-query';

export const getMyJobs = () => api.get<{ jobs: MyJob[] }>('/api/crew/my-jobs');

export const getMyJobsQueryOptions = () =>
  queryOptions({ queryKey: ['crew', 'my-jobs'], queryFn: getMyJobs, ...keptForOffline });

export const useMyJobs = () => useQuery(getMyJobsQueryOptions());
