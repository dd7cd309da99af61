// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, renderHook, waitFor } from '@testing-library/react';
import { createElement as h, type ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { useMarkChecked } from '../../src/features/grade-check/api/mark-checked';
import { getGradeChecksQueryOptions } from '../../src/features/grade-check/api/get-grade-checks';
import { emailKeys, eventKeys, messageKeys, peopleKeys, queueKeys, requestKeys } from '../../src/lib/query-keys';

const requestId = '0b6a1c52-7d4e-4f1a-8c3b-2e9d5f6a7b8c';
const otherId = '9e8d7c6b-5a4f-4e3d-8c2b-1a0f9e8d7c6b';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('marking a request checked', () => {
  it('refreshes that request, its history, the queue and its checks, and leaves every other query alone', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(() =>
        Promise.resolve(
          new Response(JSON.stringify({ request: { id: requestId, status: 'checked', version: 4 } }), {
            status: 200,
            headers: { 'Content-Type': 'application/json' },
          }),
        ),
      ),
    );
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    const touched = [
      requestKeys.one(requestId),
      eventKeys.ofRequest(requestId),
      queueKeys.list({}),
      getGradeChecksQueryOptions(requestId).queryKey,
    ];
    const untouched = [
      requestKeys.one(otherId),
      messageKeys.ofRequest(otherId),
      peopleKeys.list({}),
      emailKeys.list({}),
      ['me'],
    ];
    for (const key of [...touched, ...untouched]) client.setQueryData(key, { cached: true });
    const wrapper = ({ children }: { children: ReactNode }) => h(QueryClientProvider, { client }, children);
    const { result } = renderHook(() => useMarkChecked(), { wrapper });

    result.current.mutate({ requestId, expectedVersion: 3 });

    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    for (const key of touched) expect(client.getQueryState(key)?.isInvalidated, JSON.stringify(key)).toBe(true);
    for (const key of untouched) expect(client.getQueryState(key)?.isInvalidated, JSON.stringify(key)).toBe(false);
  });
});
