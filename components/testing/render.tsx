/** Rendering and fetch helpers for component tests. */
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { ConfirmHost } from '../ui/ConfirmDialog';

const metrics = {
  frame: { x: 0, y: 0, width: 390, height: 844 },
  insets: { top: 0, left: 0, right: 0, bottom: 0 },
};

/** Renders with a fresh query client (no retries, so failures show at once) and safe-area insets. */
export function renderWithProviders(ui: ReactElement) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return renderWithClient(client, ui);
}

/** The same, with the query client returned too (to wait until every query has settled). */
export function renderWithClient(client: QueryClient, ui: ReactElement) {
  return render(
    <QueryClientProvider client={client}>
      <SafeAreaProvider initialMetrics={metrics}>
        {ui}
        {/* Where confirmChange asks its questions, as the Shell has one. */}
        <ConfirmHost />
      </SafeAreaProvider>
    </QueryClientProvider>,
  );
}

/** A minimal fetch Response: jsdom has no Response of its own. */
export function jsonResponse(status: number, body: unknown, statusText = ''): Response {
  return {
    ok: status >= 200 && status < 300,
    status,
    statusText,
    json: async () => (typeof body === 'string' ? JSON.parse(body) : body),
  } as Response;
}

type Route = (init?: RequestInit) => Response | Promise<Response>;

/** Replaces global fetch with one that answers the given paths; any other path is a test bug. */
export function mockFetch(routes: Record<string, Route>) {
  const fetchMock = jest.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const path = String(input);
    const route = routes[path];
    if (!route) throw new Error(`unexpected fetch ${path}`);
    return route(init);
  });
  global.fetch = fetchMock as typeof fetch;
  return fetchMock;
}

/**
 * Sets the width react-native-web reports from useWindowDimensions: it reads the document's
 * client size (jsdom has no visualViewport) and updates on the window's resize event.
 */
export function setWindowWidth(width: number, height = 844) {
  const root = document.documentElement;
  Object.defineProperty(root, 'clientWidth', { configurable: true, value: width });
  Object.defineProperty(root, 'clientHeight', { configurable: true, value: height });
  window.dispatchEvent(new Event('resize'));
}
