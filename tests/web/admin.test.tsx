import { describe, expect, it } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { setSession } from '../../web/src/api/session.js';
import { AdminPage } from '../../web/src/pages/admin.js';
import { mockApi, renderWithApp } from './helpers.js';

const admin = { id: 1, name: 'Wren Hollis', email: 'admin@example.com', role: 'admin' as const };
const designer = { id: 2, name: 'Tamsin Orrell', email: 'designer@example.com', role: 'designer' as const };

describe('admin page', () => {
  it('changes a role, never the admin’s own, and hides the outbox where there is none', async () => {
    setSession({ token: 't', user: admin });
    const api = mockApi({
      'GET /api/users': { json: { items: [admin, designer], total: 2, page: 1, pageSize: 25 } },
      'PATCH /api/users/2': { json: { ...designer, role: 'tester' } },
      'GET /api/dev/outbox': { status: 404, json: { error: { code: 'not-found', message: 'There is no outbox.' } } },
    });
    renderWithApp(<AdminPage />);
    const own = (await screen.findByLabelText('Role of Wren Hollis')) as HTMLSelectElement;
    expect(own.disabled).toBe(true);
    await userEvent.selectOptions(screen.getByLabelText('Role of Tamsin Orrell'), 'tester');
    await waitFor(() => expect(api.sent.some((r) => r.method === 'PATCH')).toBe(true));
    expect(api.sent.find((r) => r.method === 'PATCH')!.body).toEqual({ role: 'tester' });
    await waitFor(() => expect(api.sent.some((r) => r.url === '/api/dev/outbox')).toBe(true));
    expect(screen.queryByRole('heading', { name: 'Outbox (development)' })).toBeNull();
  });

  it('is a not-found page for anyone but an admin', () => {
    setSession({ token: 't', user: designer });
    mockApi({});
    renderWithApp(<AdminPage />);
    expect(screen.getByRole('heading', { name: 'Not found' })).toBeTruthy();
  });
});
