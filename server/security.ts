/** Random tokens and their stored hashes: tokens are shown once, only SHA-256 is kept. */
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

export const newToken = (): string => randomBytes(32).toString('base64url');

export const hashToken = (token: string): string => createHash('sha256').update(token, 'utf8').digest('hex');

/** Compares a presented token with a stored hash in constant time. */
export function tokenMatches(token: string, storedHash: string): boolean {
  const presented = Buffer.from(hashToken(token), 'hex');
  const stored = Buffer.from(storedHash, 'hex');
  return presented.length === stored.length && timingSafeEqual(presented, stored);
}

/** Only well-formed tokens reach the database: 32 bytes in base64url is 43 characters. */
export const looksLikeToken = (token: string): boolean => /^[A-Za-z0-9_-]{43}$/.test(token);
