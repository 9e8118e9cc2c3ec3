import { MantineProvider } from '@mantine/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { MemoryRouter } from 'react-router';
import { theme } from '@/config/theme';
import { createQueryClient } from '@/lib/query-client';

/** Renders inside the app's providers with a fresh query client (the app's, so meta invalidation works; no retries) per test. */
export function renderWithProviders(ui: ReactElement, { route = '/' }: { route?: string } = {}) {
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false }, mutations: { retry: false } });
  const result = render(
    <MantineProvider theme={theme}>
      <QueryClientProvider client={queryClient}>
        <MemoryRouter initialEntries={[route]}>{ui}</MemoryRouter>
      </QueryClientProvider>
    </MantineProvider>,
  );
  return { ...result, queryClient };
}

/** A fetch stand-in that answers by method and path, recording every call. */
export function stubFetch(routes: Record<string, (init?: RequestInit) => { status: number; body?: unknown }>) {
  const calls: { method: string; path: string; body?: unknown }[] = [];
  const fetchStub = async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(typeof input === 'string' ? input : input.toString(), 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    calls.push({ method, path: url.pathname, body: init?.body ? JSON.parse(String(init.body)) : undefined });
    const handler = routes[`${method} ${url.pathname}`];
    const { status, body } = handler ? handler(init) : { status: 404, body: { statusCode: 404, error: 'Not Found', message: 'No such route in the test.' } };
    return new Response(status === 204 ? null : JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
  };
  return { fetchStub: fetchStub as typeof fetch, calls };
}
