import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getRequestMessagesQueryOptions } from './get-request-messages';
import type { OfficeMessage } from './types';

export interface OfficeMessageInput { body: string; visibility: 'internal' | 'shared' }

export const postOfficeMessage = (id: string, input: OfficeMessageInput) =>
  api.post<{ message: OfficeMessage }>(`/api/requests/${id}/messages`, input);

export function usePostOfficeMessage(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OfficeMessageInput) => postOfficeMessage(id, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getRequestMessagesQueryOptions(id).queryKey }),
  });
}
