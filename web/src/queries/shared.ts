/** What a share link opens: no session token is sent, the link is the key. */
import { queryOptions } from '@tanstack/react-query';
import { api } from '../api/client.js';
import type { PatternDetail, TallyJson } from '../api/types.js';

export const sharedKeys = {
  detail: (token: string) => ['shared', token] as const,
  tally: (token: string) => ['shared', token, 'tally'] as const,
};

const base = (token: string) => `/api/shared/${encodeURIComponent(token)}`;

export const sharedQuery = (token: string) =>
  queryOptions({
    queryKey: sharedKeys.detail(token),
    queryFn: ({ signal }) => api<PatternDetail>(base(token), { signal, anonymous: true }),
  });

export const sharedTallyQuery = (token: string) =>
  queryOptions({
    queryKey: sharedKeys.tally(token),
    queryFn: ({ signal }) => api<TallyJson>(`${base(token)}/tally`, { signal, anonymous: true }),
  });
