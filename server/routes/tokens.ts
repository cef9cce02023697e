/** Personal access tokens for the CLI: listed, made (shown once) and revoked by their owner. */
import { Router } from 'express';
import { Op } from 'sequelize';
import { z } from 'zod';
import type { AppDeps } from '../context.js';
import { auth, issueToken } from '../auth.js';
import { notFound } from '../errors.js';
import type { AccessTokenInstance } from '../models/access-token.js';
import { check, idParams } from '../validate.js';

const iso = (d: Date | null) => (d ? d.toISOString() : null);
const toToken = (t: AccessTokenInstance) => ({
  id: t.id,
  name: t.name,
  createdAt: iso(t.createdAt),
  lastUsedAt: iso(t.lastUsedAt),
  expiresAt: iso(t.expiresAt),
});

export function tokenRoutes(deps: AppDeps): Router {
  const { models } = deps.db;
  const router = Router();

  router.get('/', async (_req, res) => {
    const tokens = await models.AccessToken.findAll({
      where: {
        userId: auth(res).user.id,
        kind: 'personal',
        revokedAt: null,
        [Op.or]: [{ expiresAt: null }, { expiresAt: { [Op.gt]: new Date() } }],
      },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    });
    res.json({ items: tokens.map(toToken) });
  });

  router.post('/', async (req, res) => {
    const body = check(
      z.object({
        name: z.string().trim().min(1).max(200),
        expiresInDays: z.number().int().min(1).max(3650).optional(),
      }),
      req.body,
    );
    const expiresAt = body.expiresInDays ? new Date(Date.now() + body.expiresInDays * 86_400_000) : null;
    const { token, row } = await issueToken(models, auth(res).user, 'personal', body.name, expiresAt);
    res.status(201).json({ token, item: toToken(row) });
  });

  router.delete('/:id', async (req, res) => {
    const { id } = check(idParams, req.params);
    const [changed] = await models.AccessToken.update(
      { revokedAt: new Date() },
      { where: { id, userId: auth(res).user.id, kind: 'personal', revokedAt: null } },
    );
    if (changed === 0) throw notFound('No such token.');
    res.status(204).end();
  });

  return router;
}
