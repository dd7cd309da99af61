import { api } from '@/lib/api-client';

export interface UploadTicket {
  photo: { id: string };
  upload: { method: 'PUT'; url: string; headers: Record<string, string>; expiresInSeconds: number };
}

/** Asks the server for a short-lived URL that accepts exactly this file, straight into storage. */
export const requestUpload = (requestId: string, file: { fileName: string; contentType: string; sizeBytes: number }) =>
  api.post<UploadTicket>(`/api/requests/${requestId}/photos`, file);
