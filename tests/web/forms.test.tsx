import { describe, expect, it } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { routes } from '../../web/src/router.js';
import { getSession, setSession } from '../../web/src/api/session.js';
import { ChangePassword } from '../../web/src/pages/account.js';
import { mockApi, renderRoutes, renderWithApp } from './helpers.js';

const designer = { id: 2, name: 'Ines Marlow', email: 'designer@example.com', role: 'designer' as const };
const emptyPage = { json: { items: [], total: 0, page: 1, pageSize: 25 } };

async function signInWith(email: string, password: string) {
  await userEvent.type(screen.getByLabelText('E-mail'), email);
  await userEvent.type(screen.getByLabelText('Password'), password);
  await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('sign-in', () => {
  it('says the same thing for a wrong password as for an unknown address, and stays signed out', async () => {
    setSession(null);
    mockApi({
      'POST /api/auth/login': {
        status: 401,
        json: { error: { code: 'invalid-credentials', message: 'Wrong e-mail or password.' } },
      },
    });
    renderRoutes(routes, '/sign-in');
    await signInWith('nobody@example.com', 'not-it');
    expect((await screen.findByRole('alert')).textContent).toBe('That e-mail and password do not match an account.');
    expect(getSession()).toBeNull();
  });

  it('signs in, keeps the session, sends the token as Bearer, and goes where the visitor was headed', async () => {
    setSession(null);
    const api = mockApi({
      'POST /api/auth/login': { json: { token: 'tok-123', user: designer } },
      'GET /api/patterns': emptyPage,
    });
    const { router } = renderRoutes(routes, '/library?q=band');
    await screen.findByRole('heading', { name: 'Sign in' });
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/library?q=band')}`);
    await signInWith('designer@example.com', 'fourfold-demo');
    await screen.findByRole('heading', { name: 'Library' });
    expect(getSession()?.token).toBe('tok-123');
    const list = api.sent.find((r) => r.url.startsWith('/api/patterns'))!;
    expect(list.headers.Authorization).toBe('Bearer tok-123');
    expect(list.url).toContain('q=band');
    expect(api.sent.find((r) => r.url === '/api/auth/login')!.headers.Authorization).toBeUndefined();
  });

  it('shows a designer with no patterns where to upload and how to push', async () => {
    setSession({ token: 't', user: designer });
    mockApi({ 'GET /api/patterns': emptyPage });
    renderRoutes(routes, '/library');
    expect((await screen.findByRole('link', { name: 'Upload pattern files' })).getAttribute('href')).toBe('/upload');
    expect(screen.getByText(/fourfold push/)).toBeTruthy();
  });
});

describe('passwords', () => {
  it('asks for a reset link with a reply that does not tell whether the address exists', async () => {
    const api = mockApi({ 'POST /api/auth/reset-request': { status: 202, json: { ok: true } } });
    renderRoutes(routes, '/forgot-password');
    await userEvent.type(screen.getByLabelText('E-mail'), 'someone@example.com');
    await userEvent.click(screen.getByRole('button', { name: 'Send the link' }));
    expect((await screen.findByRole('status')).textContent).toMatch(/^If someone@example.com has an account/);
    expect(api.sent[0]!.body).toEqual({ email: 'someone@example.com' });
  });

  it('checks a new password before sending it, then resets with the token from the link and signs in', async () => {
    setSession(null);
    const api = mockApi({
      'POST /api/auth/reset': { json: { token: 'tok-new', user: { ...designer, role: 'tester' } } },
      'GET /api/patterns': emptyPage,
    });
    renderRoutes(routes, '/reset?token=abc123&invite=1');
    expect(screen.getByRole('heading', { name: 'Choose your password' })).toBeTruthy();
    const [first, second] = [screen.getByLabelText('New password'), screen.getByLabelText('New password again')];
    const save = screen.getByRole('button', { name: 'Save the password and sign in' });
    await userEvent.type(first, 'short');
    await userEvent.type(second, 'short');
    await userEvent.click(save);
    expect((await screen.findByRole('alert')).textContent).toBe('The password needs at least 8 characters.');
    await userEvent.type(first, '-enough');
    await userEvent.type(second, '-other!');
    await userEvent.click(save);
    expect((await screen.findByRole('alert')).textContent).toBe('The two passwords are not the same.');
    expect(api.sent).toHaveLength(0);
    await userEvent.clear(second);
    await userEvent.type(second, 'short-enough');
    await userEvent.click(save);
    await screen.findByRole('heading', { name: 'Library' });
    expect(api.sent[0]!.body).toEqual({ token: 'abc123', password: 'short-enough' });
    expect(getSession()?.token).toBe('tok-new');
  });

  it('says when a reset link has been used or has expired', async () => {
    mockApi({
      'POST /api/auth/reset': {
        status: 400,
        json: { error: { code: 'invalid-token', message: 'The link is not valid.' } },
      },
    });
    renderRoutes(routes, '/reset?token=old');
    await userEvent.type(screen.getByLabelText('New password'), 'long-enough');
    await userEvent.type(screen.getByLabelText('New password again'), 'long-enough');
    await userEvent.click(screen.getByRole('button', { name: 'Save the password and sign in' }));
    expect((await screen.findByRole('alert')).textContent).toMatch(/used or has expired/);
  });

  it('changes the password while signed in and shows the server’s answer to a wrong current one', async () => {
    setSession({ token: 't', user: designer });
    let calls = 0;
    const api = mockApi({
      'POST /api/auth/password': () =>
        ++calls === 1
          ? {
              status: 400,
              json: {
                error: {
                  code: 'invalid-input',
                  message: 'Invalid input',
                  details: [{ path: ['current'], message: 'The current password is not right.' }],
                },
              },
            }
          : { status: 204 },
    });
    renderWithApp(<ChangePassword />);
    const fill = async (current: string) => {
      await userEvent.clear(screen.getByLabelText('Current password'));
      await userEvent.type(screen.getByLabelText('Current password'), current);
      await userEvent.clear(screen.getByLabelText('New password'));
      await userEvent.type(screen.getByLabelText('New password'), 'a-new-password');
      await userEvent.clear(screen.getByLabelText('New password again'));
      await userEvent.type(screen.getByLabelText('New password again'), 'a-new-password');
      await userEvent.click(screen.getByRole('button', { name: 'Change password' }));
    };
    await fill('wrong');
    expect((await screen.findByRole('alert')).textContent).toBe('The current password is not right.');
    await fill('fourfold-demo');
    await waitFor(() => expect(screen.getByRole('status').textContent).toBe('Your password has been changed.'));
    expect(api.sent[1]!.body).toEqual({ current: 'fourfold-demo', password: 'a-new-password' });
    expect((screen.getByLabelText('Current password') as HTMLInputElement).value).toBe('');
  });
});
