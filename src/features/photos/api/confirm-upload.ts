import type { PhotoConfirmInput, PhotoView } from '@shared/contracts/photos';
import { api } from '@/lib/api-client';

/** After the bytes are in storage: the server checks them and lists the photo. */
export const confirmUpload = (requestId: string, photoId: string, extra: PhotoConfirmInput) =>
  api.post<{ photo: PhotoView }>(`/api/requests/${requestId}/photos/${photoId}/confirm`, extra);
