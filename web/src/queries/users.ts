/** Accounts and roles, for admins; and the caught outbox of e-mails in development. */
import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api, withQuery } from '../api/client.js';
import type { OutboxMail, Page, Role, User } from '../api/types.js';

export const userKeys = { all: ['users'] as const, outbox: ['outbox'] as const };

export const usersQuery = (params: { q?: string; page?: number } = {}) =>
  queryOptions({
    queryKey: [...userKeys.all, params],
    queryFn: ({ signal }) => api<Page<User>>(withQuery('/api/users', params), { signal }),
  });

export const outboxQuery = () =>
  queryOptions({
    queryKey: userKeys.outbox,
    queryFn: ({ signal }) => api<{ items: OutboxMail[] }>('/api/dev/outbox', { signal }),
    retry: false,
  });

export function useSetRole() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { id: number; role: Role }) =>
      api<User>(`/api/users/${input.id}`, { method: 'PATCH', json: { role: input.role } }),
    onSuccess: () => client.invalidateQueries({ queryKey: userKeys.all }),
  });
}

export function useCreateUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string; email: string; role: Role; password: string }) =>
      api<User>('/api/users', { method: 'POST', json: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: userKeys.all }),
  });
}

export function useDeleteUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/api/users/${id}`, { method: 'DELETE' }),
    onSuccess: () => client.invalidateQueries({ queryKey: userKeys.all }),
  });
}
