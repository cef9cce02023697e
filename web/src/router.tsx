/**
 * The route tree. Loaders prime the query cache (ensureQueryData) so pages
 * render with data on first paint; pages then read the same query options
 * and stay live. Pages that pull in the engine, the chart or the editor are
 * lazy, which keeps the first download small.
 */
import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, redirect, type LoaderFunctionArgs, type RouteObject } from 'react-router-dom';
import { getSession } from './api/session.js';
import { AppShell } from './components/app-shell.js';
import { RouteError } from './components/route-error.js';
import { SignInPage } from './pages/sign-in.js';
import { ForgotPasswordPage } from './pages/forgot-password.js';
import { ResetPasswordPage } from './pages/reset-password.js';
import { LibraryPage, libraryLoader } from './pages/library.js';
import { NotFoundPage } from './pages/not-found.js';

/** Signed-in pages send a visitor to sign in, then back to where they were going. */
function requireSession({ request }: LoaderFunctionArgs): void {
  if (getSession()) return;
  const url = new URL(request.url);
  throw redirect(`/sign-in?next=${encodeURIComponent(url.pathname + url.search)}`);
}

type Loader = (args: LoaderFunctionArgs) => unknown;

/**
 * The check runs inside each signed-in page's own loader: the router runs
 * a parent's and a child's loaders at the same time, so a parent guard
 * alone would not stop the child's request going out without a session.
 */
function signedIn(route: RouteObject): RouteObject {
  const guard =
    (loader?: Loader): Loader =>
    (args) => {
      requireSession(args);
      return loader ? loader(args) : null;
    };
  if (typeof route.lazy === 'function') {
    const lazy = route.lazy;
    // A lazy route's loader comes from its module; a static one would win over it.
    return {
      ...route,
      lazy: async () => {
        const loaded = await lazy();
        return { ...loaded, loader: guard(loaded.loader as Loader | undefined) };
      },
    } as RouteObject;
  }
  return { ...route, loader: guard(route.loader as Loader | undefined) } as RouteObject;
}

export function routes(queryClient: QueryClient): RouteObject[] {
  const errorElement = <RouteError />;
  const withErrors = (list: RouteObject[]): RouteObject[] =>
    list.map((r) => ({ ...r, errorElement, children: r.children ? withErrors(r.children) : undefined }) as RouteObject);
  return withErrors([
    {
      element: <AppShell />,
      hydrateFallbackElement: <p role="status">Loading…</p>,
      children: [
        { index: true, loader: () => redirect(getSession() ? '/library' : '/sign-in') },
        { path: 'sign-in', element: <SignInPage /> },
        { path: 'forgot-password', element: <ForgotPasswordPage /> },
        { path: 'reset', element: <ResetPasswordPage /> },
        {
          path: 's/:token',
          lazy: async () => {
            const m = await import('./pages/shared-view.js');
            return { Component: m.SharedViewPage, loader: m.sharedLoader(queryClient) };
          },
        },
        {
          path: 'preview',
          lazy: async () => ({ Component: (await import('./pages/preview.js')).PreviewPage }),
        },
        ...[
          { path: 'library', element: <LibraryPage />, loader: libraryLoader(queryClient) },
          {
            path: 'upload',
            lazy: async () => ({ Component: (await import('./pages/upload.js')).UploadPage }),
          },
          {
            path: 'patterns/:id',
            lazy: async () => {
              const m = await import('./pages/pattern.js');
              return { Component: m.PatternPage, loader: m.patternLoader(queryClient) };
            },
          },
          {
            path: 'patterns/:id/edit',
            lazy: async () => {
              const m = await import('./pages/pattern-edit.js');
              return { Component: m.PatternEditPage, loader: m.patternEditLoader(queryClient) };
            },
          },
          {
            path: 'patterns/:id/print',
            lazy: async () => {
              const m = await import('./pages/pattern-print.js');
              return { Component: m.PatternPrintPage, loader: m.patternPrintLoader(queryClient) };
            },
          },
          {
            path: 'account',
            lazy: async () => ({ Component: (await import('./pages/account.js')).AccountPage }),
          },
          {
            path: 'admin',
            lazy: async () => ({ Component: (await import('./pages/admin.js')).AdminPage }),
          },
        ].map(signedIn),
        { path: '*', element: <NotFoundPage /> },
      ],
    },
  ]);
}

export const createRouter = (queryClient: QueryClient) => createBrowserRouter(routes(queryClient));
