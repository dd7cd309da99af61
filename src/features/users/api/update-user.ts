import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@shared/workflow/statuses';
import { api } from '@/lib/api-client';
import { getUsersQueryOptions, type UserRow } from './get-users';

export const updateUser = ({ id, ...change }: { id: string; role?: Role; disabled?: boolean }) =>
  api.patch<{ user: UserRow }>(`/api/users/${id}`, change);

export const inviteUser = (input: { email: string; name: string; role: Role }) => api.post<{ user: UserRow }>('/api/users', input);

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateUser, onSuccess: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey.slice(0, 1) }) });
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: inviteUser, onSuccess: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey.slice(0, 1) }) });
}
