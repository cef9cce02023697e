/**
 * Rendering a page or component the way the app does (router + query
 * client), and a fetch stand-in that answers like the documented API
 * (docs/server.md) and records every request it was sent.
 */
import type { ReactElement } from 'react';
import { render } from '@testing-library/react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { vi } from 'vitest';
import { compile } from '../../shared/compile.js';
import { createQueryClient } from '../../web/src/query-client.js';
import type { Model } from '../../shared/model.js';

export interface SentRequest {
  method: string;
  url: string;
  headers: Record<string, string>;
  body: unknown;
}

type Answer = { status?: number; json?: unknown };
type Handler = (req: SentRequest) => Answer;

/** Replaces fetch; `routes` maps "METHOD /path" (query ignored) to an answer. Unknown routes answer 404. */
export function mockApi(routes: Record<string, Handler | Answer>) {
  const sent: SentRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = String(input);
    const method = init.method ?? 'GET';
    const headers = (init.headers ?? {}) as Record<string, string>;
    const body = typeof init.body === 'string' ? JSON.parse(init.body) : init.body;
    const req = { method, url, headers, body };
    sent.push(req);
    const route = routes[`${method} ${url.split('?')[0]}`];
    const answer =
      route === undefined
        ? { status: 404, json: { error: { code: 'not-found', message: 'Not found.' } } }
        : typeof route === 'function'
          ? route(req)
          : route;
    const status = answer.status ?? 200;
    return new Response(status === 204 ? null : JSON.stringify(answer.json ?? {}), {
      status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { sent };
}

export function renderRoutes(routes: RouteObject[] | ((client: QueryClient) => RouteObject[]), path: string) {
  // The app's own client settings, so cache freshness and retries behave as they do in the browser.
  const client = createQueryClient();
  const router = createMemoryRouter(typeof routes === 'function' ? routes(client) : routes, { initialEntries: [path] });
  const view = render(
    <QueryClientProvider client={client}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...view, router, client };
}

/** One element on a route, for components that need the router and the query client. */
export const renderWithApp = (element: ReactElement, path = '/') => renderRoutes([{ path: '*', element }], path);

export function modelOf(source: string): Model {
  const result = compile(source);
  const errors = result.diagnostics.filter((d) => d.severity === 'error');
  if (errors.length) throw new Error(`test pattern has errors: ${errors.map((e) => e.message).join('; ')}`);
  return result.value.model;
}
