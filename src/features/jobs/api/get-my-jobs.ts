import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MyJob } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';

export const getMyJobs = () => api.get<{ jobs: MyJob[] }>('/api/crew/my-jobs');

export const getMyJobsQueryOptions = () => queryOptions({ queryKey: ['crew', 'my-jobs'], queryFn: getMyJobs });

export const useMyJobs = () => useQuery(getMyJobsQueryOptions());
