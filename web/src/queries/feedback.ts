/** Tester notes on a row or unit of a pattern. */
import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../api/client.js';
import type { FeedbackNote } from '../api/types.js';
import { patternKeys } from './patterns.js';

export const feedbackKeys = {
  all: (id: number) => [...patternKeys.detail(id), 'feedback'] as const,
  list: (id: number, version: number) => [...feedbackKeys.all(id), version] as const,
};

/**
 * The notes as the server shows them on one version: those whose row (and
 * unit) that version still has, each with the version it was written on.
 */
export const feedbackQuery = (id: number, version: number) =>
  queryOptions({
    queryKey: feedbackKeys.list(id, version),
    queryFn: ({ signal }) =>
      api<{ items: FeedbackNote[] }>(`/api/patterns/${id}/feedback?version=${version}`, { signal }),
  });

export function useAddNote(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (note: { row: number; unit?: number; text: string; version?: number }) =>
      api<FeedbackNote>(`/api/patterns/${id}/feedback`, { method: 'POST', json: note }),
    onSuccess: () => client.invalidateQueries({ queryKey: feedbackKeys.all(id) }),
  });
}

export function useResolveNote(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (noteId: number) =>
      api<FeedbackNote>(`/api/patterns/${id}/feedback/${noteId}`, { method: 'PATCH', json: { status: 'resolved' } }),
    onSuccess: () => client.invalidateQueries({ queryKey: feedbackKeys.all(id) }),
  });
}
