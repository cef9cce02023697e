/**
 * The signed-in user and their session token, kept in localStorage so a
 * reload keeps the session. Components read it through `useSession`.
 */
import { useSyncExternalStore } from 'react';
import type { User } from './types.js';

export interface Session {
  token: string;
  user: User;
}

const KEY = 'fourfold.session';
const listeners = new Set<() => void>();
let cached: Session | null | undefined;

function read(): Session | null {
  try {
    const raw = localStorage.getItem(KEY);
    return raw ? (JSON.parse(raw) as Session) : null;
  } catch {
    return null;
  }
}

export function getSession(): Session | null {
  if (cached === undefined) cached = read();
  return cached;
}

export function setSession(session: Session | null): void {
  cached = session;
  if (session) localStorage.setItem(KEY, JSON.stringify(session));
  else localStorage.removeItem(KEY);
  for (const l of listeners) l();
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export const useSession = (): Session | null => useSyncExternalStore(subscribe, getSession, getSession);
