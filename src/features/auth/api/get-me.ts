import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role } from '@shared/workflow/statuses';
import { api } from '@/lib/api-client';
import { keptForOffline } from '@/lib/react-query';

export interface Me {
  id: string;
  email: string;
  name: string;
  role: Role;
}

/** The signed-in person, or null when nobody is signed in (the server answers `{ user: null }`, not a 401). */
export async function getMe(): Promise<Me | null> {
  const { user } = await api.get<{ user: Me | null }>('/api/me');
  return user;
}

export const getMeQueryOptions = () =>
  queryOptions({ queryKey: ['me'], queryFn: getMe, staleTime: 5 * 60_000, ...keptForOffline });

export const useMe = () => useQuery(getMeQueryOptions());
