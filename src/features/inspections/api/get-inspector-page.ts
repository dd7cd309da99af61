import { queryOptions, useQuery } from '@tanstack/react-query';
import { inspectorTokenHeader, type InspectorPageView } from '@shared/contracts/inspections';
import { api } from '@/lib/api-client';
import { inspectionKeys } from '@/lib/query-keys';

/** The inspector's page: no session, the link's token in a header. */
export const getInspectorPage = (requestId: string, token: string) =>
  api.withHeaders({ [inspectorTokenHeader]: token }).get<InspectorPageView>(`/api/inspect/${requestId}`);

// The photo and document links inside expire after five minutes, so the page refreshes well before that.
export const getInspectorPageQueryOptions = (requestId: string, token: string) =>
  queryOptions({
    queryKey: inspectionKeys.page(requestId),
    queryFn: () => getInspectorPage(requestId, token),
    staleTime: 60_000,
    refetchInterval: 4 * 60_000,
    retry: false,
  });

export const useInspectorPage = (requestId: string, token: string) =>
  useQuery({ ...getInspectorPageQueryOptions(requestId, token), enabled: token.length > 0 });
