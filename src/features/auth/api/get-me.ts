import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role } from '@shared/workflow/statuses';
import { api, ApiError } from '@/lib/api-client';
import { keptForOffline } from '@/lib/react-query';

export interface Me {
  id: string;
  email: string;
  name: string;
  role: Role;
}

/** The signed-in person, or null when nobody is signed in (a 401 is an answer here, not an error). */
export async function getMe(): Promise<Me | null> {
  try {
    const { user } = await api.get<{ user: Me }>('/api/me');
    return user;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const getMeQueryOptions = () =>
  queryOptions({ queryKey: ['me'], queryFn: getMe, staleTime: 5 * 60_000, ...keptForOffline });

export const useMe = () => useQuery(getMeQueryOptions());
