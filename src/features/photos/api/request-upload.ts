import type { PhotoUploadInput, UploadTicket } from '@shared/contracts/photos';
import { api } from '@/lib/api-client';

/**
 * Asks the server for a short-lived URL that accepts exactly this file, straight into storage. The type is the
 * browser's word for the file, which may be none the server takes; the server's answer then names the field.
 */
export const requestUpload = (
  requestId: string,
  file: Omit<PhotoUploadInput, 'contentType'> & { contentType: string },
) => api.post<UploadTicket>(`/api/requests/${requestId}/photos`, file);
