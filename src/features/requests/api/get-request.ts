import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OfficeRequestView, RequestAnswer } from '@shared/contracts/requests';
import { api } from '@/lib/api-client';
import { requestKeys } from '@/lib/query-keys';

export const getRequest = (id: string) => api.get<RequestAnswer>(`/api/requests/${id}`);

export const getRequestQueryOptions = (id: string) =>
  queryOptions({ queryKey: requestKeys.one(id), queryFn: () => getRequest(id), staleTime: 5_000 });

export const useRequest = (id: string) => useQuery(getRequestQueryOptions(id));

/**
 * The same query, read by an office screen: for office roles the server adds its bookkeeping fields to the view
 * (server/services/requests/request-view.ts).
 */
export const useOfficeRequest = (id: string) =>
  useQuery({ ...getRequestQueryOptions(id), select: (answer) => answer as RequestAnswer<OfficeRequestView> });
