import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  inspectorTokenHeader,
  type InspectionOutcomeInput,
  type InspectorPageView,
} from '@shared/contracts/inspections';
import { api } from '@/lib/api-client';
import { inspectionKeys } from '@/lib/query-keys';

export const recordOutcome = (requestId: string, token: string, input: InspectionOutcomeInput) =>
  api
    .withHeaders({ [inspectorTokenHeader]: token })
    .post<InspectorPageView>(`/api/inspect/${requestId}/outcome`, input);

/** The answer is the page as it now stands, so it replaces the cached page rather than fetching it again. */
export function useRecordOutcome(requestId: string, token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InspectionOutcomeInput) => recordOutcome(requestId, token, input),
    onSuccess: (page) => queryClient.setQueryData(inspectionKeys.page(requestId), page),
  });
}
