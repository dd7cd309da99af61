import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InspectionsAnswer } from '@shared/contracts/inspections';
import { api } from '@/lib/api-client';
import { inspectionKeys } from '@/lib/query-keys';

export const getInspections = (requestId: string) =>
  api.get<InspectionsAnswer>(`/api/requests/${requestId}/inspections`);

export const getInspectionsQueryOptions = (requestId: string) =>
  queryOptions({ queryKey: inspectionKeys.ofRequest(requestId), queryFn: () => getInspections(requestId) });

export const useInspections = (requestId: string, enabled = true) =>
  useQuery({ ...getInspectionsQueryOptions(requestId), enabled });
