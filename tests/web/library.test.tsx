import { describe, expect, it } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { routes } from '../../web/src/router.js';
import { setSession } from '../../web/src/api/session.js';
import { paramsFrom } from '../../web/src/pages/library.js';
import { mockApi, renderRoutes } from './helpers.js';

const tester = { id: 3, name: 'Odile Ferrant', email: 'tester@example.com', role: 'tester' as const };

describe('library page', () => {
  it('searches on the server a moment after typing stops, and keeps the search in the URL', async () => {
    setSession({ token: 't', user: tester });
    const api = mockApi({ 'GET /api/patterns': { json: { items: [], total: 0, page: 1, pageSize: 25 } } });
    const { router } = renderRoutes(routes, '/library');
    expect((await screen.findByText('When a designer shares a pattern with you, it appears here.')).tagName).toBe('P');
    await userEvent.type(screen.getByLabelText('Search titles'), 'heron');
    await waitFor(() => expect(router.state.location.search).toBe('?q=heron'));
    await screen.findByText('No pattern title contains “heron”.');
    const urls = api.sent.map((r) => r.url);
    expect(urls[0]).toBe('/api/patterns?sort=updated&dir=desc&page=1&pageSize=25');
    expect(urls.at(-1)).toBe('/api/patterns?q=heron&sort=updated&dir=desc&page=1&pageSize=25');
    // One request for the finished word, not one per letter.
    expect(urls.filter((u) => u.includes('q='))).toHaveLength(1);
  });

  it('shows in the search box what the list was searched for when the reader goes back and forward', async () => {
    setSession({ token: 't', user: tester });
    const api = mockApi({ 'GET /api/patterns': { json: { items: [], total: 0, page: 1, pageSize: 25 } } });
    const { router } = renderRoutes(routes, '/library');
    const box = await screen.findByRole('searchbox', { name: 'Search titles' });
    await userEvent.type(box, 'heron{Enter}');
    await waitFor(() => expect(router.state.location.search).toBe('?q=heron'));
    await userEvent.clear(box);
    await userEvent.type(box, 'band{Enter}');
    await waitFor(() => expect(router.state.location.search).toBe('?q=band'));
    await router.navigate(-1);
    await waitFor(() => expect(router.state.location.search).toBe('?q=heron'));
    await waitFor(() => expect((box as HTMLInputElement).value).toBe('heron'));
    await router.navigate(-1);
    await waitFor(() => expect((box as HTMLInputElement).value).toBe(''));
    await router.navigate(2);
    await waitFor(() => expect((box as HTMLInputElement).value).toBe('band'));
    // The box catching up with the URL starts no search of its own.
    await new Promise((r) => setTimeout(r, 400));
    expect(router.state.location.search).toBe('?q=band');
    expect(api.sent.at(-1)!.url).toContain('q=band');
  });

  it('reads sort and page from the URL, ignoring values the server would refuse', () => {
    expect(paramsFrom(new URLSearchParams('sort=title&page=2'))).toMatchObject({ sort: 'title', dir: 'asc', page: 2 });
    expect(paramsFrom(new URLSearchParams('sort=colour&dir=sideways&page=-3'))).toMatchObject({
      sort: 'updated',
      dir: 'desc',
      page: 1,
    });
  });

  it('shows a not-found page, not an error, for a pattern the reader may not see', async () => {
    setSession({ token: 't', user: tester });
    mockApi({ 'GET /api/patterns': { json: { items: [], total: 0, page: 1, pageSize: 25 } } });
    renderRoutes(routes, '/patterns/99');
    expect(await screen.findByRole('heading', { name: 'Not found' })).toBeTruthy();
    expect(screen.getByText('There is nothing here, or it has not been shared with you.')).toBeTruthy();
  });
});

describe('an ended session', () => {
  it('sends the reader to sign in, and back to the same page afterwards', async () => {
    setSession({ token: 'revoked-elsewhere', user: tester });
    mockApi({
      'GET /api/patterns': { json: { items: [], total: 0, page: 1, pageSize: 25 } },
      'GET /api/tokens': { status: 401, json: { error: { code: 'unauthenticated', message: 'Please sign in.' } } },
    });
    const { router } = renderRoutes(routes, '/library');
    await userEvent.click(await screen.findByRole('link', { name: 'Account' }));
    await screen.findByRole('heading', { name: 'Sign in' });
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/account')}`);
  });

  it('on a first load, says so where the page would be', async () => {
    setSession({ token: 'expired', user: tester });
    mockApi({
      'GET /api/patterns': { status: 401, json: { error: { code: 'unauthenticated', message: 'Please sign in.' } } },
    });
    renderRoutes(routes, '/library');
    expect((await screen.findByRole('link', { name: 'Sign in' })).getAttribute('href')).toBe(
      `/sign-in?next=${encodeURIComponent('/library')}`,
    );
  });
});
