import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PhotoLinkAnswer, PhotosAnswer } from '@shared/contracts/photos';
import { api } from '@/lib/api-client';
import { photoKeys } from '@/lib/query-keys';

export type ListedPhoto = PhotosAnswer['photos'][number];

export const getPhotos = (requestId: string) => api.get<PhotosAnswer>(`/api/requests/${requestId}/photos`);

// The links inside expire after five minutes, so the list is refreshed well before that.
export const getPhotosQueryOptions = (requestId: string) =>
  queryOptions({
    queryKey: photoKeys.ofRequest(requestId),
    queryFn: () => getPhotos(requestId),
    staleTime: 60_000,
    refetchInterval: 4 * 60_000,
  });

export const usePhotos = (requestId: string) => useQuery(getPhotosQueryOptions(requestId));

/** A fresh link for one photo, for when the one in the list has expired. */
export const getPhotoUrl = (requestId: string, photoId: string) =>
  api.get<PhotoLinkAnswer>(`/api/requests/${requestId}/photos/${photoId}/url`);
