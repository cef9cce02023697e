import { describe, expect, it } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Link, useSearchParams } from 'react-router-dom';
import { AppShell } from '../../web/src/components/app-shell.js';
import { renderRoutes } from './helpers.js';

function First() {
  const [, setSearch] = useSearchParams();
  return (
    <>
      <h1>First page</h1>
      <Link to="/second">To the second page</Link>
      <button type="button" onClick={() => setSearch({ q: 'band' })}>
        Search
      </button>
    </>
  );
}

const routes = [
  {
    element: <AppShell />,
    children: [
      { path: 'first', element: <First /> },
      { path: 'second', element: <h1>Second page</h1> },
      { path: 'bare', element: <p>No heading here.</p> },
    ],
  },
];

// Source: WCAG 2.2 technique G124 / ARIA APG guidance on single-page apps: move focus to the new content on a page change.
describe('focus on a change of page', () => {
  it('leaves the first page of a visit alone, then focuses the new page’s heading', async () => {
    const { router } = renderRoutes(routes, '/first');
    await screen.findByRole('heading', { name: 'First page' });
    expect(document.activeElement).toBe(document.body);
    await userEvent.click(screen.getByRole('link', { name: 'To the second page' }));
    const heading = await screen.findByRole('heading', { name: 'Second page' });
    await waitFor(() => expect(document.activeElement).toBe(heading));
    // Focusable by script, but no extra Tab stop.
    expect(heading.getAttribute('tabindex')).toBe('-1');
    await router.navigate('/bare');
    await waitFor(() => expect(document.activeElement).toBe(document.getElementById('main')));
  });

  it('keeps focus where it is when only the query changes', async () => {
    renderRoutes(routes, '/first');
    const button = await screen.findByRole('button', { name: 'Search' });
    await userEvent.click(button);
    expect(document.activeElement).toBe(button);
  });

  it('has a skip link, first in Tab order, that moves focus into the page', async () => {
    renderRoutes(routes, '/first');
    await screen.findByRole('heading', { name: 'First page' });
    await userEvent.tab();
    const skip = screen.getByRole('link', { name: 'Skip to content' });
    expect(document.activeElement).toBe(skip);
    await userEvent.keyboard('{Enter}');
    expect(document.activeElement).toBe(screen.getByRole('heading', { name: 'First page' }));
  });
});
