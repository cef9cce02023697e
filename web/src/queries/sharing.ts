/** Who can see a pattern: share links and invited testers, for its owner. */
import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../api/client.js';
import type { Access } from '../api/types.js';
import { patternKeys } from './patterns.js';

export const accessKeys = { detail: (id: number) => [...patternKeys.detail(id), 'access'] as const };

export const accessQuery = (id: number) =>
  queryOptions({
    queryKey: accessKeys.detail(id),
    queryFn: ({ signal }) => api<Access>(`/api/patterns/${id}/access`, { signal }),
  });

/** Invalidates the pattern's access and the library (its "shared" column). */
function useAccessMutation<I, O>(id: number, fn: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: accessKeys.detail(id) }),
        client.invalidateQueries({ queryKey: patternKeys.lists() }),
      ]),
  });
}

export const useCreateShare = (id: number) =>
  useAccessMutation(id, (input: { expiresInDays?: number }) =>
    api<{ id: number; token: string; url: string; expiresAt: string | null }>(`/api/patterns/${id}/shares`, {
      method: 'POST',
      json: input,
    }),
  );

export const useRevokeShare = (id: number) =>
  useAccessMutation(id, (shareId: number) => api<void>(`/api/patterns/${id}/shares/${shareId}`, { method: 'DELETE' }));

export const useInviteTester = (id: number) =>
  useAccessMutation(id, (input: { email: string; name?: string }) =>
    api<{ tester: { id: number; name: string; email: string }; created: boolean }>(`/api/patterns/${id}/invites`, {
      method: 'POST',
      json: input,
    }),
  );

export const useRemoveTester = (id: number) =>
  useAccessMutation(id, (userId: number) => api<void>(`/api/patterns/${id}/invites/${userId}`, { method: 'DELETE' }));
