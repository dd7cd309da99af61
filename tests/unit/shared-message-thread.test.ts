// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createElement as h } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { MessageThread } from '../../src/features/messages/components/message-thread';

const requestId = '6f1c2a7e-3b1d-4c55-9a43-1f2e3d4c5b6a';
interface Stored {
  id: string;
  body: string;
  createdAt: string;
  authorName: string;
  authorRole: 'staff';
  mine: boolean;
  internal: boolean;
}
let stored: Stored[] = [];

/** One in-memory endpoint for GET and POST /api/requests/:id/messages, as the server answers the office. */
function fakeServer(input: RequestInfo | URL, init?: RequestInit) {
  const url = String(input);
  expect(url).toBe(`/api/requests/${requestId}/messages`);
  if (init?.method === 'POST') {
    const { body, visibility } = JSON.parse(String(init.body)) as { body: string; visibility?: string };
    const message = {
      id: `m${stored.length + 1}`,
      body,
      createdAt: '2026-05-04T10:00:00.000Z',
      authorName: 'Dana Office',
      authorRole: 'staff' as const,
      mine: true,
      internal: visibility === 'internal',
    };
    stored = [...stored, message];
    return Promise.resolve(
      new Response(JSON.stringify({ message }), { status: 201, headers: { 'Content-Type': 'application/json' } }),
    );
  }
  return Promise.resolve(
    new Response(JSON.stringify({ messages: stored }), {
      status: 200,
      headers: { 'Content-Type': 'application/json' },
    }),
  );
}

beforeEach(() => {
  stored = [];
  vi.stubGlobal('fetch', vi.fn(fakeServer));
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('two screens reading the same request’s messages', () => {
  it('a message sent from one thread shows in the other without a reload', async () => {
    const client = new QueryClient({ defaultOptions: { queries: { staleTime: 30_000, retry: false } } });
    render(
      h(
        QueryClientProvider,
        { client },
        h('section', { 'aria-label': 'office screen' }, h(MessageThread, { requestId, office: true })),
        h(
          'section',
          { 'aria-label': 'field sheet' },
          h(MessageThread, { requestId, writeLabel: 'Write to the homeowner and the office' }),
        ),
      ),
    );
    const office = screen.getByRole('region', { name: 'office screen' });
    const sheet = screen.getByRole('region', { name: 'field sheet' });
    await waitFor(() => expect(within(office).getByText('No messages yet.')).toBeTruthy());
    await waitFor(() => expect(within(sheet).getByText('No messages yet.')).toBeTruthy());

    fireEvent.change(within(sheet).getByLabelText('Write to the homeowner and the office'), {
      target: { value: 'The culvert is in; backfill tomorrow.' },
    });
    fireEvent.click(within(sheet).getByRole('button', { name: 'Send message' }));

    await waitFor(() => expect(within(sheet).getByText('The culvert is in; backfill tomorrow.')).toBeTruthy());
    await waitFor(() => expect(within(office).getByText('The culvert is in; backfill tomorrow.')).toBeTruthy());
  });
});
