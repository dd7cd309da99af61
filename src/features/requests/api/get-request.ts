import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RequestDetail, RequestDocument } from './types';

export const getRequest = (id: string) => api.get<{ request: RequestDetail; documents: RequestDocument[] }>(`/api/requests/${id}`);

export const getRequestQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['requests', id], queryFn: () => getRequest(id) });

export const useRequest = (id: string) => useQuery(getRequestQueryOptions(id));
