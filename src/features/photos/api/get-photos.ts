import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface Photo {
  id: string;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  caption: string;
  gpsLat: number | null;
  gpsLng: number | null;
  createdAt: string;
  url: string;
}

export const getPhotos = (requestId: string) => api.get<{ photos: Photo[] }>(`/api/requests/${requestId}/photos`);

// The links inside expire after five minutes, so the list is refreshed well before that.
export const getPhotosQueryOptions = (requestId: string) =>
  queryOptions({ queryKey: ['requests', requestId, 'photos'], queryFn: () => getPhotos(requestId), staleTime: 60_000, refetchInterval: 4 * 60_000 });

export const usePhotos = (requestId: string) => useQuery(getPhotosQueryOptions(requestId));
