import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OfficePhoto } from './types';

export const getRequestPhotos = (id: string) => api.get<{ photos: OfficePhoto[] }>(`/api/requests/${id}/photos`);

// The photo links are presigned and expire, so the list is fetched again well before they do.
export const getRequestPhotosQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['office', 'photos', id], queryFn: () => getRequestPhotos(id), staleTime: 60_000, refetchInterval: 4 * 60_000 });

export const useRequestPhotos = (id: string) => useQuery(getRequestPhotosQueryOptions(id));

/** A fresh link for one photo, for when the one in the list has expired. */
export const getPhotoUrl = (id: string, photoId: string) =>
  api.get<{ url: string; expiresInSeconds: number }>(`/api/requests/${id}/photos/${photoId}/url`);
