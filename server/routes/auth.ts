import { Router, type RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { z } from 'zod';
import type { AppDeps } from '../context.js';
import { auth, bearer, issueSession } from '../auth.js';
import { HttpError } from '../errors.js';
import { hashPassword, issuePasswordLink, redeemPasswordLink, verifyPassword } from '../passwords.js';
import { toUser } from '../serialize.js';
import { check, email, password } from '../validate.js';

const loginBody = z.object({ email, password: z.string().min(1).max(200) });

export function authRoutes(deps: AppDeps): Router {
  const { models } = deps.db;
  const router = Router();
  const accountLimit = deps.loginLimit ?? 10;
  const tooMany: Parameters<typeof rateLimit>[0] = {
    windowMs: 60_000,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new HttpError(429, 'too-many-requests', 'Too many sign-in attempts; wait a minute and try again.')),
  };
  // Per address, so guessing one account's password is slow from anywhere.
  const perAccount = rateLimit({
    ...tooMany,
    limit: accountLimit,
    keyGenerator: (req) =>
      `login:${String((req.body as { email?: unknown } | undefined)?.email ?? '')
        .trim()
        .toLowerCase()}`,
  });
  // Per client address too, so trying one password on many accounts is slow as well.
  const perClient = rateLimit({ ...tooMany, limit: accountLimit * 10 });
  const signInLimit: RequestHandler = (req, res, next) =>
    perAccount(req, res, (error?: unknown) => (error ? next(error) : perClient(req, res, next)));

  router.post('/login', signInLimit, async (req, res) => {
    const body = check(loginBody, req.body);
    const user = await models.User.findOne({ where: { email: body.email } });
    if (!(await verifyPassword(user, body.password)) || !user) {
      throw new HttpError(401, 'invalid-credentials', 'The e-mail address or the password is wrong.');
    }
    const { token } = await issueSession(models, user);
    res.json({ token, user: toUser(user) });
  });

  router.post('/reset-request', signInLimit, async (req, res) => {
    const body = check(z.object({ email }), req.body);
    const user = await models.User.findOne({ where: { email: body.email } });
    if (user) {
      const link = await issuePasswordLink(models, user, 'reset', deps.publicUrl);
      await deps.mailer.send(
        user.email,
        'Reset your Fourfold password',
        `Hello ${user.name},\n\nSomeone asked to reset the password of this Fourfold account. To choose a new one, open:\n\n${link}\n\nThe link works once, within the next hour. If you did not ask for this, ignore this mail.\n`,
      );
    }
    res.status(202).json({ ok: true });
  });

  router.post('/reset', async (req, res) => {
    const body = check(z.object({ token: z.string().max(100), password }), req.body);
    const user = await redeemPasswordLink(models, body.token, body.password);
    if (!user)
      throw new HttpError(400, 'invalid-token', 'This link has expired or was already used; ask for a new one.');
    const { token } = await issueSession(models, user);
    res.json({ token, user: toUser(user) });
  });

  const signedIn = bearer(models);
  router.get('/me', signedIn, (_req, res) => {
    res.json({ user: toUser(auth(res).user) });
  });

  router.post('/logout', signedIn, async (_req, res) => {
    await auth(res).token.update({ revokedAt: new Date() });
    res.status(204).end();
  });

  router.post('/password', signedIn, async (req, res) => {
    const body = check(z.object({ current: z.string().max(200), password }), req.body);
    const { user } = auth(res);
    if (!(await verifyPassword(user, body.current))) {
      throw new HttpError(400, 'invalid-input', 'The current password is wrong.', [
        { path: 'current', message: 'wrong password' },
      ]);
    }
    await user.update({ passwordHash: await hashPassword(body.password) });
    res.status(204).end();
  });

  return router;
}
