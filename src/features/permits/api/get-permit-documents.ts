import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { documentKeys } from '@/lib/query-keys';

export interface PermitDocument {
  id: string;
  kind: string;
  title: string;
  contentType: string;
  sizeBytes: number;
  createdAt: string;
  url: string;
}

/** GET /api/requests/:id/documents; the permit panel shows the packets filed and the authority's letters. */
export const getPermitDocumentsQueryOptions = (requestId: string) =>
  queryOptions({
    queryKey: documentKeys.ofRequest(requestId),
    queryFn: () => api.get<{ documents: PermitDocument[] }>(`/api/requests/${requestId}/documents`),
    staleTime: 60_000,
    // Download links expire after a few minutes; refetching a little sooner keeps the ones on screen usable.
    refetchInterval: 240_000,
  });

export const usePermitDocuments = (requestId: string) => useQuery(getPermitDocumentsQueryOptions(requestId));

/** GET /api/requests/:id/permit-packet?paper=: the packet as it would be filed now (a PDF, opened in a new tab). */
export const permitPacketHref = (requestId: string, paper: 'letter' | 'a4') =>
  `/api/requests/${requestId}/permit-packet?paper=${paper}`;
