import type { ReactElement } from 'react';
import { render } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { ThemeProvider } from '@mui/material/styles';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { theme } from '../lib/theme.js';
import { NotifierProvider } from '../components/ui/notifier.js';

interface RenderOptions {
  /** Starting URL, e.g. `/doc-sets/d1/pages?sort=-rank`. */
  route?: string;
  /** Route pattern the element is mounted at, e.g. `/doc-sets/:docSetId/pages`. */
  path?: string;
  /** Extra routes, e.g. the page a form redirects to. */
  extraRoutes?: Array<{ path: string; element: ReactElement }>;
}

/** Renders a screen with theme, a fresh QueryClient (no retries), notifier and a memory router. */
export function renderWithProviders(ui: ReactElement, options: RenderOptions = {}) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const router = createMemoryRouter([{ path: options.path ?? '*', element: ui }, ...(options.extraRoutes ?? [])], {
    initialEntries: [options.route ?? '/'],
  });
  const result = render(
    <ThemeProvider theme={theme}>
      <QueryClientProvider client={queryClient}>
        <NotifierProvider>
          <RouterProvider router={router} />
        </NotifierProvider>
      </QueryClientProvider>
    </ThemeProvider>,
  );
  return { ...result, router, queryClient };
}

/** A `fetch` stand-in answering by `METHOD path` (path without query); records every call. */
export function fakeFetch(routes: Record<string, (url: URL, init?: RequestInit) => { status?: number; body?: unknown }>) {
  const calls: Array<{ method: string; url: URL; body: unknown }> = [];
  const fn = async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const url = new URL(String(input), 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    calls.push({ method, url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
    const handler = routes[`${method} ${url.pathname}`];
    if (!handler) return new Response(JSON.stringify({ statusCode: 404, code: 'NOT_FOUND', message: 'No fake route' }), { status: 404 });
    const { status = 200, body } = handler(url, init);
    return new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
  };
  return { fn, calls };
}
