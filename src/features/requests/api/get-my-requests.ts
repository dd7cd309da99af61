import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RequestStatus } from '@shared/workflow/statuses';
import { api } from '@/lib/api-client';

export interface MyRequestRow {
  id: string;
  reference: string;
  status: RequestStatus;
  siteAddress: string;
  roadName: string;
  statusChangedAt: string;
  updatedAt: string;
  expected: string;
}

export const getMyRequests = () => api.get<{ requests: MyRequestRow[] }>('/api/requests/mine');

export const getMyRequestsQueryOptions = () => queryOptions({ queryKey: ['requests', 'mine'], queryFn: getMyRequests });

export const useMyRequests = () => useQuery(getMyRequestsQueryOptions());
