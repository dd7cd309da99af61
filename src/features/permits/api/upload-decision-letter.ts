import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LetterConfirmAnswer, LetterUploadAnswer, LetterUploadInput } from '@shared/contracts/permits';
import { api } from '@/lib/api-client';
import { documentKeys, eventKeys } from '@/lib/query-keys';

/**
 * POST /api/requests/:id/decision-letters, the PUT straight into storage, then POST …/confirm: the server checks the
 * stored file's first bytes before listing it. The type sent is the browser's word for the file; the server decides.
 */
export async function uploadDecisionLetter(requestId: string, file: File) {
  const announced = {
    fileName: file.name,
    contentType: file.type as LetterUploadInput['contentType'],
    sizeBytes: file.size,
  };
  const ticket = await api.post<LetterUploadAnswer>(`/api/requests/${requestId}/decision-letters`, announced);
  const put = await fetch(ticket.upload.url, { method: 'PUT', headers: ticket.upload.headers, body: file });
  if (!put.ok) throw new Error('Storage did not take the file. Try again.');
  return api.post<LetterConfirmAnswer>(`/api/requests/${requestId}/decision-letters/confirm`, {
    uploadId: ticket.uploadId,
    ...announced,
  });
}

export function useUploadDecisionLetter(requestId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadDecisionLetter(requestId, file),
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: documentKeys.ofRequest(requestId) }),
        client.invalidateQueries({ queryKey: eventKeys.ofRequest(requestId) }),
      ]),
  });
}
