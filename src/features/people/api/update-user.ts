import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AddPersonInput, PersonView, UpdatePersonInput } from '@shared/contracts/people';
import { api } from '@/lib/api-client';
import { auditKeys, peopleKeys } from '@/lib/query-keys';

export const updateUser = ({ id, ...change }: UpdatePersonInput & { id: string }) =>
  api.patch<{ user: PersonView }>(`/api/users/${id}`, change);

export const inviteUser = (input: AddPersonInput) => api.post<{ user: PersonView }>('/api/users', input);

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: peopleKeys.all }),
        queryClient.invalidateQueries({ queryKey: auditKeys.all }),
      ]),
  });
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: peopleKeys.all }),
        queryClient.invalidateQueries({ queryKey: auditKeys.all }),
      ]),
  });
}
