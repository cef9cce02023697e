import type { LoaderFunctionArgs } from 'react-router-dom';

/** A pattern id and optional version from the URL; a malformed id is a plain not-found. */
export function patternParams({ params, request }: Pick<LoaderFunctionArgs, 'params' | 'request'>): {
  id: number;
  version?: number;
} {
  const id = Number(params.id);
  if (!Number.isSafeInteger(id) || id < 1) throw new Response('Not found', { status: 404 });
  const v = Number(new URL(request.url).searchParams.get('version'));
  return { id, version: Number.isSafeInteger(v) && v > 0 ? v : undefined };
}
