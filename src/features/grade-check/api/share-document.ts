import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getDocumentsQueryOptions } from './get-documents';

export const shareDocument = ({
  documentId,
  sharedWithApplicant,
}: {
  documentId: string;
  sharedWithApplicant: boolean;
}) =>
  api.patch<{ document: { id: string; sharedWithApplicant: boolean } }>(`/api/documents/${documentId}`, {
    sharedWithApplicant,
  });

export function useShareDocument(requestId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: shareDocument,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getDocumentsQueryOptions(requestId).queryKey }),
  });
}
