/**
 * Bearer authentication through passport-http-bearer: session tokens from
 * sign-in and personal access tokens alike, looked up by their SHA-256.
 */
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { Passport } from 'passport';
import { Strategy as BearerStrategy } from 'passport-http-bearer';
import { Op } from 'sequelize';
import type { Models } from './models/index.js';
import type { AccessTokenInstance, TokenKind } from './models/access-token.js';
import type { Role, UserInstance } from './models/user.js';
import { forbidden, HttpError, unauthenticated } from './errors.js';
import { hashToken, looksLikeToken, newToken, tokenMatches } from './security.js';

export interface AuthContext {
  user: UserInstance;
  token: AccessTokenInstance;
}

export const SESSION_DAYS = 30;
const DAY_MS = 86_400_000;
/** lastUsedAt is refreshed at most this often, so reads do not each cost a write. */
const TOUCH_MS = 60_000;
/**
 * A verified token is trusted this long without asking the database again.
 * Any change to an account or a token made through this app empties the
 * cache at once (model hooks below), so sign-out and role changes apply to
 * the next request; the limit only bounds changes made by another process.
 */
const CACHE_MS = 5_000;
const CACHE_MAX = 10_000;

export function auth(res: Response): AuthContext {
  const context = res.locals.auth as AuthContext | undefined;
  if (!context) throw unauthenticated();
  return context;
}

export async function issueToken(
  models: Models,
  user: UserInstance,
  kind: TokenKind,
  name: string,
  expiresAt: Date | null,
): Promise<{ token: string; row: AccessTokenInstance }> {
  const token = newToken();
  const row = await models.AccessToken.create({ userId: user.id, kind, name, tokenHash: hashToken(token), expiresAt });
  return { token, row };
}

export const issueSession = (models: Models, user: UserInstance) =>
  issueToken(models, user, 'session', 'sign-in', new Date(Date.now() + SESSION_DAYS * DAY_MS));

async function findByToken(models: Models, token: string): Promise<AuthContext | null> {
  if (!looksLikeToken(token)) return null;
  const row = await models.AccessToken.findOne({
    where: {
      tokenHash: hashToken(token),
      revokedAt: null,
      [Op.or]: [{ expiresAt: null }, { expiresAt: { [Op.gt]: new Date() } }],
    },
    include: [{ model: models.User, as: 'user', required: true }],
  });
  if (!row || !tokenMatches(token, row.tokenHash)) return null;
  if (!row.lastUsedAt || Date.now() - row.lastUsedAt.getTime() > TOUCH_MS) {
    await row.update({ lastUsedAt: new Date() });
  }
  return { user: (row as AccessTokenInstance & { user: UserInstance }).user, token: row };
}

/** Middleware that requires a valid bearer token and puts the caller in `res.locals.auth`. */
export function bearer(models: Models): RequestHandler {
  const cache = new Map<string, { found: AuthContext; until: number }>();
  const forget = () => cache.clear();
  for (const hook of ['afterUpdate', 'afterDestroy', 'afterBulkUpdate', 'afterBulkDestroy'] as const) {
    models.User.addHook(hook, forget);
    models.AccessToken.addHook(hook, forget);
  }
  const lookup = async (token: string): Promise<AuthContext | null> => {
    const now = Date.now();
    const hit = cache.get(token);
    if (hit && hit.until > now) return hit.found;
    const found = await findByToken(models, token);
    if (found) {
      if (cache.size >= CACHE_MAX) cache.clear();
      const expires = found.token.expiresAt?.getTime() ?? Infinity;
      cache.set(token, { found, until: Math.min(now + CACHE_MS, expires) });
    }
    return found;
  };
  const passport = new Passport();
  passport.use(
    new BearerStrategy((token, done) => {
      lookup(token).then(
        (found) => done(null, found ?? false),
        (error: unknown) => done(error),
      );
    }),
  );
  const authenticate = (req: Request, res: Response, next: NextFunction) =>
    passport.authenticate('bearer', { session: false }, (error: unknown, found: AuthContext | false) => {
      if (error) return next(error);
      if (!found) return next(new HttpError(401, 'unauthenticated', 'Sign in first: a valid bearer token is needed.'));
      res.locals.auth = found;
      next();
    })(req, res, next);
  return authenticate as RequestHandler;
}

/** 403 unless the caller has one of these roles; runs before any pattern is looked up. */
export const allow =
  (...roles: Role[]): RequestHandler =>
  (_req, res, next) => {
    if (!roles.includes(auth(res).user.role)) throw forbidden();
    next();
  };
