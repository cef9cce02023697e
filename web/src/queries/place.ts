/** A signed-in reader's place in the stepper, kept per pattern on the server. */
import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../api/client.js';
import type { Place } from '../api/types.js';
import { patternKeys } from './patterns.js';

export const placeKeys = { detail: (id: number) => [...patternKeys.detail(id), 'place'] as const };

export const placeQuery = (id: number) =>
  queryOptions({
    queryKey: placeKeys.detail(id),
    queryFn: ({ signal }) => api<Place | null>(`/api/patterns/${id}/place`, { signal }),
  });

export function useSavePlace(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (place: Place) => api<Place>(`/api/patterns/${id}/place`, { method: 'PUT', json: place }),
    onSuccess: (place) => client.setQueryData(placeKeys.detail(id), place),
  });
}
