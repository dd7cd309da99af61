import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { documentKeys } from '@/lib/query-keys';

export interface RequestDocument {
  id: string;
  requestId: string;
  gradeCheckId: string | null;
  kind: string;
  title: string;
  contentType: string;
  sizeBytes: number;
  sharedWithApplicant: boolean;
  createdAt: string;
  url: string;
  urlExpiresAt: string;
}

export const getDocuments = (requestId: string) =>
  api.get<{ documents: RequestDocument[] }>(`/api/requests/${requestId}/documents`);

// Download links expire after a few minutes; refetching a little sooner keeps the ones on screen usable.
export const getDocumentsQueryOptions = (requestId: string) =>
  queryOptions({
    queryKey: documentKeys.ofRequest(requestId),
    queryFn: () => getDocuments(requestId),
    staleTime: 60_000,
    refetchInterval: 240_000,
  });

export const useDocuments = (requestId: string) => useQuery(getDocumentsQueryOptions(requestId));
