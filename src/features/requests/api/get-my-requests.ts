import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MyRequestRow } from '@shared/contracts/requests';
import { api } from '@/lib/api-client';
import { requestKeys } from '@/lib/query-keys';

export const getMyRequests = () => api.get<{ requests: MyRequestRow[] }>('/api/requests/mine');

export const getMyRequestsQueryOptions = () => queryOptions({ queryKey: requestKeys.mine(), queryFn: getMyRequests });

export const useMyRequests = () => useQuery(getMyRequestsQueryOptions());
