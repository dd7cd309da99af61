import { api } from '@/lib/api-client';

/** A fresh short-lived link, asked for at the moment of opening so it has not expired on a page left open. */
export const getDocumentUrl = (requestId: string, documentId: string) =>
  api.get<{ url: string; expiresInSeconds: number }>(`/api/requests/${requestId}/documents/${documentId}/url`);
