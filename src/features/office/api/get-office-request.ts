import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OfficeRequest } from './types';

export const getOfficeRequest = (id: string) => api.get<{ request: OfficeRequest }>(`/api/requests/${id}`);

export const getOfficeRequestQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['office', 'request', id], queryFn: () => getOfficeRequest(id), staleTime: 5_000 });

export const useOfficeRequest = (id: string) => useQuery(getOfficeRequestQueryOptions(id));
