import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CrewPhotosAnswer } from '@shared/contracts/crew-photos';
import { api } from '@/lib/api-client';
import { photoKeys } from '@/lib/query-keys';

export type ListedCrewPhoto = CrewPhotosAnswer['photos'][number];

export const getCrewPhotos = (requestId: string) => api.get<CrewPhotosAnswer>(`/api/requests/${requestId}/crew-photos`);

// The links inside expire after five minutes, so the list is refreshed well before that.
export const getCrewPhotosQueryOptions = (requestId: string) =>
  queryOptions({
    queryKey: photoKeys.crewOfRequest(requestId),
    queryFn: () => getCrewPhotos(requestId),
    staleTime: 60_000,
    refetchInterval: 4 * 60_000,
  });

export const useCrewPhotos = (requestId: string, opts: { enabled?: boolean } = {}) =>
  useQuery({ ...getCrewPhotosQueryOptions(requestId), enabled: opts.enabled ?? true });
