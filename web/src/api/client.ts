/**
 * The one way the app talks to the server: JSON in and out, the session
 * token as a Bearer header, and the server's one error shape turned into an
 * `ApiError` that error elements and forms can show.
 */
import { getSession, setSession } from './session.js';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  json?: unknown;
  body?: FormData;
  signal?: AbortSignal;
  /** Send no session token (share links, sign-in). */
  anonymous?: boolean;
}

async function send(path: string, options: RequestOptions): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  const token = options.anonymous ? undefined : getSession()?.token;
  if (token) headers.Authorization = `Bearer ${token}`;
  let body: BodyInit | undefined = options.body;
  if (options.json !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.json);
  }
  let response: Response;
  try {
    response = await fetch(path, { method: options.method ?? 'GET', headers, body, signal: options.signal });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'network', 'The server could not be reached. Check the connection and try again.');
  }
  if (response.ok) return response;
  // A token the server no longer accepts (expired, revoked): forget it, so the app asks to sign in.
  if (response.status === 401 && token) setSession(null);
  const parsed = (await response.json().catch(() => null)) as {
    error?: { code?: string; message?: string; details?: unknown };
  } | null;
  const error = parsed?.error;
  throw new ApiError(
    response.status,
    error?.code ?? `http-${response.status}`,
    error?.message ?? response.statusText,
    error?.details,
  );
}

export async function api<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const response = await send(path, options);
  if (response.status === 204) return undefined as T;
  return (await response.json()) as T;
}

export async function apiText(path: string, options: RequestOptions = {}): Promise<string> {
  return (await send(path, options)).text();
}

export async function apiBlob(path: string, options: RequestOptions = {}): Promise<Blob> {
  return (await send(path, options)).blob();
}

/** Query strings without empty values, so cache keys and URLs agree. */
export function withQuery(path: string, params: Record<string, string | number | undefined>): string {
  const search = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== '') search.set(k, String(v));
  const s = search.toString();
  return s ? `${path}?${s}` : path;
}
