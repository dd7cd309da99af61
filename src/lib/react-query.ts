import { onlineManager, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

export function createQueryClient() {
  // React Query takes the connection for granted until the browser says otherwise; a page loaded with no signal
  // (from the service worker) starts out knowing, so its queries wait instead of failing.
  if (typeof navigator !== 'undefined') onlineManager.setOnline(navigator.onLine);
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // Client errors will not change on retry; network blips may.
        retry: (count, error) => !(error instanceof ApiError && error.status < 500) && count < 2,
      },
      mutations: { retry: false },
    },
  });
}

/**
 * For the queries the service worker keeps a copy of (vite.config.ts, `gradepass-crew-data`): ask even when the
 * browser says it is offline, and the worker answers from its copy; retries still wait for the connection. Every
 * other query waits for the connection instead of failing.
 */
export const keptForOffline = { networkMode: 'offlineFirst' } as const;
