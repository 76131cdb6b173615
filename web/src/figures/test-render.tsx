import { Theme } from '@radix-ui/themes';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { vi } from 'vitest';

/** Renders inside the app's providers with a fresh query cache (no retries, so errors show at once). */
export function renderWithQuery(ui: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const view = render(
    <Theme>
      <QueryClientProvider client={client}>{ui}</QueryClientProvider>
    </Theme>,
  );
  return { client, ...view };
}

/** Replaces fetch with answers per path; returns the mock to inspect calls. */
export function mockFetch(answer: (path: string, body: unknown) => { status?: number; json: unknown }) {
  const fn = vi.fn(async (url: string, init?: RequestInit) => {
    const body = init?.body ? JSON.parse(String(init.body)) : undefined;
    const a = answer(url, body);
    return new Response(JSON.stringify(a.json), { status: a.status ?? 200, headers: { 'Content-Type': 'application/json' } });
  });
  vi.stubGlobal('fetch', fn);
  return fn;
}
