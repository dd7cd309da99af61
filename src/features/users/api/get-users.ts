import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role } from '@shared/workflow/statuses';
import { api } from '@/lib/api-client';

export interface UserRow { id: string; email: string; name: string; role: Role; disabled: boolean; lastSignInAt: string | null }

export const getUsers = (filter: { search?: string; role?: Role }) => api.get<{ users: UserRow[] }>('/api/users', filter);

export const getUsersQueryOptions = (filter: { search?: string; role?: Role } = {}) =>
  queryOptions({ queryKey: ['users', filter], queryFn: () => getUsers(filter) });

export const useUsers = (filter: { search?: string; role?: Role } = {}) => useQuery(getUsersQueryOptions(filter));
