import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/**
 * GET /api/requests/:id/documents/:documentId/url: a short-lived link to the document an event names, fetched when
 * the office opens it (the link expires within minutes, so it is not kept on the timeline).
 */
export const getEventDocumentLink = (requestId: string, documentId: string) =>
  api.get<{ url: string; expiresInSeconds: number }>(`/api/requests/${requestId}/documents/${documentId}/url`);

export function useOpenEventDocument(requestId: string) {
  return useMutation({
    mutationFn: async (documentId: string) => {
      // Opened before the link arrives, so the browser treats it as the click's own window.
      const opened = window.open('', '_blank');
      const { url } = await getEventDocumentLink(requestId, documentId);
      if (opened) opened.location.href = url;
      else window.location.href = url;
    },
  });
}
