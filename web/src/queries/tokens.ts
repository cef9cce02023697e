/** Personal access tokens for the CLI: the secret is shown once, then only the name. */
import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../api/client.js';
import type { AccessToken } from '../api/types.js';

export const tokenKeys = { all: ['tokens'] as const };

export const tokensQuery = () =>
  queryOptions({
    queryKey: tokenKeys.all,
    queryFn: ({ signal }) => api<{ items: AccessToken[] }>('/api/tokens', { signal }),
  });

export function useCreateToken() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string; expiresInDays?: number }) =>
      api<{ token: string; item?: AccessToken }>('/api/tokens', { method: 'POST', json: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: tokenKeys.all }),
  });
}

export function useRevokeToken() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/api/tokens/${id}`, { method: 'DELETE' }),
    onSuccess: () => client.invalidateQueries({ queryKey: tokenKeys.all }),
  });
}
