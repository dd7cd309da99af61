import { api } from '@/lib/api-client';

/** After the bytes are in storage: the server checks them and lists the photo. */
export const confirmUpload = (requestId: string, photoId: string, extra: { gpsLat?: number | null; gpsLng?: number | null }) =>
  api.post<{ photo: { id: string } }>(`/api/requests/${requestId}/photos/${photoId}/confirm`, extra);
