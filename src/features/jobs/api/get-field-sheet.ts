import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FieldSheetView } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';
import { keptForOffline } from '@/lib/react-query';

export const getFieldSheet = (id: string) => api.get<FieldSheetView>(`/api/crew/jobs/${id}/field-sheet`);

export const getFieldSheetQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['crew', 'field-sheet', id], queryFn: () => getFieldSheet(id), ...keptForOffline });

export const useFieldSheet = (id: string) => useQuery(getFieldSheetQueryOptions(id));
