/**
 * The viewer's API as the CLI (login, push, pull) sees it: where the saved
 * token lives, and one fetch wrapper that turns the API's error shape into
 * a message.
 */
import { chmod, mkdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import envPaths from 'env-paths';

export interface Saved {
  server: string;
  token: string;
}

/** The config folder: FOURFOLD_CONFIG_DIR when set (tests, portable installs), else the platform's. */
export const configFile = (env: Record<string, string | undefined>): string =>
  join(env.FOURFOLD_CONFIG_DIR || envPaths('fourfold', { suffix: '' }).config, 'viewer.json');

export async function loadSaved(env: Record<string, string | undefined>): Promise<Saved | null> {
  try {
    const data = JSON.parse(await readFile(configFile(env), 'utf8')) as Partial<Saved>;
    return typeof data.server === 'string' && typeof data.token === 'string'
      ? { server: data.server, token: data.token }
      : null;
  } catch {
    return null;
  }
}

/** Written with mode 600 (and the folder 700): the token is as good as the password. */
export async function save(env: Record<string, string | undefined>, saved: Saved): Promise<string> {
  const file = configFile(env);
  await mkdir(join(file, '..'), { recursive: true, mode: 0o700 });
  await writeFile(file, `${JSON.stringify(saved, null, 2)}\n`, { mode: 0o600 });
  await chmod(file, 0o600);
  return file;
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

export async function call<T>(
  server: string,
  token: string | null,
  method: string,
  path: string,
  body?: unknown,
): Promise<T> {
  let res: Response;
  try {
    res = await fetch(`${server}${path}`, {
      method,
      headers: {
        Accept: 'application/json',
        ...(token ? { Authorization: `Bearer ${token}` } : {}),
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch (error) {
    throw new ApiError(
      0,
      'unreachable',
      `cannot reach ${server}: ${(error as Error).cause ?? (error as Error).message}`,
    );
  }
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  let data: unknown = null;
  try {
    data = JSON.parse(text);
  } catch {
    data = null;
  }
  if (!res.ok) {
    const error = (data as { error?: { code?: string; message?: string } } | null)?.error;
    throw new ApiError(res.status, error?.code ?? 'http', error?.message ?? `${server} answered ${res.status}`);
  }
  return data as T;
}
