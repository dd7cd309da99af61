import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { forgetCachedData } from '@/lib/service-worker';

export const signOut = () => api.post<void>('/auth/sign-out');

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: async () => {
      queryClient.clear();
      await forgetCachedData();
      window.location.assign('/');
    },
  });
}
