import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

export function createQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // Ask even when the browser says it is offline: the service worker answers the crew's job data from its
        // copy. Retries still wait for the connection to come back.
        networkMode: 'offlineFirst',
        // Client errors will not change on retry; network blips may.
        retry: (count, error) => !(error instanceof ApiError && error.status < 500) && count < 2,
      },
      mutations: { retry: false },
    },
  });
}
