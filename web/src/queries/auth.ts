/** Sign-in, sign-out and passwords. The session itself lives in api/session.ts. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../api/client.js';
import { getSession, setSession } from '../api/session.js';
import type { User } from '../api/types.js';

export function useSignIn() {
  return useMutation({
    mutationFn: (input: { email: string; password: string }) =>
      api<{ token: string; user: User }>('/api/auth/login', { method: 'POST', json: input, anonymous: true }),
    onSuccess: (result) => setSession(result),
  });
}

export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    // Signing out revokes the token on the server; the local session goes either way.
    mutationFn: () => (getSession() ? api<void>('/api/auth/logout', { method: 'POST' }) : Promise.resolve()),
    onSettled: () => {
      setSession(null);
      client.clear();
    },
  });
}

export const useRequestReset = () =>
  useMutation({
    mutationFn: (email: string) =>
      api<unknown>('/api/auth/reset-request', { method: 'POST', json: { email }, anonymous: true }),
  });

export const useResetPassword = () =>
  useMutation({
    mutationFn: (input: { token: string; password: string }) =>
      api<{ token: string; user: User }>('/api/auth/reset', { method: 'POST', json: input, anonymous: true }),
    onSuccess: (result) => setSession(result),
  });

export const useChangePassword = () =>
  useMutation({
    mutationFn: (input: { current: string; password: string }) =>
      api<unknown>('/api/auth/password', { method: 'POST', json: input }),
  });
