import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AsBuiltPageView } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';
import { keptForOffline } from '@/lib/react-query';

export const getAsBuilt = (id: string) => api.get<AsBuiltPageView>(`/api/crew/jobs/${id}/as-built`);

export const getAsBuiltQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['crew', 'as-built', id], queryFn: () => getAsBuilt(id), ...keptForOffline });

export const useAsBuilt = (id: string, enabled = true) => useQuery({ ...getAsBuiltQueryOptions(id), enabled });
