/**
 * Patterns: the library list, one pattern, its versions and its tally.
 * Keys nest under ['patterns'] so a save can invalidate everything about
 * patterns at once, or one pattern's subtree by its detail key.
 */
import { keepPreviousData, queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api, withQuery } from '../api/client.js';
import type {
  CheckedFile,
  Page,
  PatternDetail,
  PatternSummary,
  TallyJson,
  UploadedItem,
  VersionInfo,
} from '../api/types.js';

export type SortKey = 'updated' | 'title' | 'beads';
export interface ListParams {
  q: string;
  sort: SortKey;
  dir: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

export const defaultListParams: ListParams = { q: '', sort: 'updated', dir: 'desc', page: 1, pageSize: 25 };

export const patternKeys = {
  all: ['patterns'] as const,
  lists: () => [...patternKeys.all, 'list'] as const,
  list: (params: ListParams) => [...patternKeys.lists(), params] as const,
  detail: (id: number) => [...patternKeys.all, 'detail', id] as const,
  version: (id: number, version: number | undefined) =>
    [...patternKeys.detail(id), 'version', version ?? 'current'] as const,
  versions: (id: number) => [...patternKeys.detail(id), 'versions'] as const,
  tally: (id: number, version: number | undefined) =>
    [...patternKeys.detail(id), 'tally', version ?? 'current'] as const,
};

export const patternListQuery = (params: ListParams) =>
  queryOptions({
    queryKey: patternKeys.list(params),
    queryFn: ({ signal }) => api<Page<PatternSummary>>(withQuery('/api/patterns', { ...params }), { signal }),
    placeholderData: keepPreviousData,
  });

export const patternQuery = (id: number, version?: number) =>
  queryOptions({
    queryKey: patternKeys.version(id, version),
    queryFn: ({ signal }) => api<PatternDetail>(withQuery(`/api/patterns/${id}`, { version }), { signal }),
  });

export const versionsQuery = (id: number) =>
  queryOptions({
    queryKey: patternKeys.versions(id),
    queryFn: ({ signal }) => api<{ items: VersionInfo[] }>(`/api/patterns/${id}/versions`, { signal }),
  });

export const tallyQuery = (id: number, version?: number) =>
  queryOptions({
    queryKey: patternKeys.tally(id, version),
    queryFn: ({ signal }) => api<TallyJson>(withQuery(`/api/patterns/${id}/tally`, { version }), { signal }),
  });

export function useUploadPatterns() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { files: File[] } | { source: string }) => {
      if ('source' in input)
        return api<{ items: UploadedItem[] }>('/api/patterns', { method: 'POST', json: { source: input.source } });
      const form = new FormData();
      for (const f of input.files) form.append('file', f, f.name);
      return api<{ items: UploadedItem[] }>('/api/patterns', { method: 'POST', body: form });
    },
    onSuccess: () => client.invalidateQueries({ queryKey: patternKeys.lists() }),
  });
}

export function useSaveVersion(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (source: string) =>
      api<{ created: boolean; pattern: PatternDetail }>(`/api/patterns/${id}`, { method: 'PUT', json: { source } }),
    onSuccess: () => client.invalidateQueries({ queryKey: patternKeys.all }),
  });
}

export function useDeletePattern(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/api/patterns/${id}`, { method: 'DELETE' }),
    onSuccess: () => client.invalidateQueries({ queryKey: patternKeys.all }),
  });
}

/** Checks files or pasted text on the server without saving anything (the upload page's first step). */
export const useCheck = () =>
  useMutation({
    mutationFn: (input: { files: File[] } | { source: string }) => {
      if ('source' in input)
        return api<{ files: CheckedFile[] }>('/api/check', {
          method: 'POST',
          json: { source: input.source, name: 'pasted.ffp' },
        });
      const form = new FormData();
      for (const f of input.files) form.append('file', f, f.name);
      return api<{ files: CheckedFile[] }>('/api/check', { method: 'POST', body: form });
    },
  });
