/** Share links, invited testers and the access list, all for the pattern's owner. */
import { Router } from 'express';
import { Op } from 'sequelize';
import { z } from 'zod';
import type { AppDeps } from '../context.js';
import { allow, auth } from '../auth.js';
import { ownPattern } from '../access.js';
import { HttpError, notFound } from '../errors.js';
import { issuePasswordLink } from '../passwords.js';
import { hashToken, looksLikeToken, newToken, tokenMatches } from '../security.js';
import { check, email, idParam, idParams } from '../validate.js';

const DAY_MS = 86_400_000;
const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function sharingRoutes(deps: AppDeps): Router {
  const { models } = deps.db;
  const router = Router();
  router.use('/:id/shares', allow('designer'));
  router.use('/:id/access', allow('designer'));
  router.use('/:id/invites', allow('designer'));

  router.post('/:id/shares', async (req, res) => {
    const { id } = check(idParams, req.params);
    const body = check(z.object({ expiresInDays: z.number().int().min(1).max(365).optional() }), req.body ?? {});
    const ctx = auth(res);
    const pattern = await ownPattern(models, ctx, id);
    const token = newToken();
    const expiresAt = body.expiresInDays ? new Date(Date.now() + body.expiresInDays * DAY_MS) : null;
    const share = await models.ShareLink.create({
      patternId: pattern.id,
      createdById: ctx.user.id,
      tokenHash: hashToken(token),
      expiresAt,
    });
    res.status(201).json({ id: share.id, token, url: `${deps.publicUrl}/s/${token}`, expiresAt: iso(expiresAt) });
  });

  router.delete('/:id/shares/:shareId', async (req, res) => {
    const { id, shareId } = check(z.object({ id: idParam, shareId: idParam }), req.params);
    const pattern = await ownPattern(models, auth(res), id);
    const [changed] = await models.ShareLink.update(
      { revokedAt: new Date() },
      { where: { id: shareId, patternId: pattern.id, revokedAt: null } },
    );
    if (changed === 0 && !(await models.ShareLink.findOne({ where: { id: shareId, patternId: pattern.id } })))
      throw notFound('No such share link.');
    res.status(204).end();
  });

  router.get('/:id/access', async (req, res) => {
    const { id } = check(idParams, req.params);
    const pattern = await ownPattern(models, auth(res), id);
    const [shares, invitations] = await Promise.all([
      models.ShareLink.findAll({
        where: { patternId: pattern.id },
        order: [
          ['createdAt', 'DESC'],
          ['id', 'DESC'],
        ],
      }),
      models.Invitation.findAll({
        where: { patternId: pattern.id },
        include: [{ model: models.User, as: 'tester' }],
        order: [['createdAt', 'ASC']],
      }),
    ]);
    const now = Date.now();
    res.json({
      shares: shares.map((s) => ({
        id: s.id,
        createdAt: iso(s.createdAt),
        expiresAt: iso(s.expiresAt),
        revoked: s.revokedAt !== null,
        active: s.revokedAt === null && (s.expiresAt === null || s.expiresAt.getTime() > now),
      })),
      testers: invitations.map((i) => {
        const tester = (i as typeof i & { tester: { id: number; name: string; email: string } }).tester;
        return { id: tester.id, name: tester.name, email: tester.email, invitedAt: iso(i.createdAt) };
      }),
    });
  });

  router.post('/:id/invites', async (req, res) => {
    const { id } = check(idParams, req.params);
    const body = check(z.object({ email, name: z.string().trim().min(1).max(200).optional() }), req.body);
    const ctx = auth(res);
    const pattern = await ownPattern(models, ctx, id);
    let tester = await models.User.findOne({ where: { email: body.email } });
    const created = !tester;
    tester ??= await models.User.create({
      email: body.email,
      name: body.name ?? body.email.split('@')[0]!,
      role: 'tester',
    });
    if (tester.role !== 'tester') {
      throw new HttpError(
        409,
        'conflict',
        'This address belongs to a designer or admin account; only testers can be invited.',
      );
    }
    await models.Invitation.findOrCreate({
      where: { patternId: pattern.id, testerId: tester.id },
      defaults: { patternId: pattern.id, testerId: tester.id, invitedById: ctx.user.id },
    });
    const open = `${deps.publicUrl}/patterns/${pattern.id}`;
    const setPassword = tester.passwordHash ? null : await issuePasswordLink(models, tester, 'invite', deps.publicUrl);
    await deps.mailer.send(
      tester.email,
      `${ctx.user.name} invited you to test "${pattern.title}"`,
      [
        `Hello ${tester.name},`,
        '',
        `${ctx.user.name} would like you to test the pattern "${pattern.title}" on Fourfold.`,
        setPassword ? `First choose a password (the link works once, within the hour):\n\n${setPassword}\n` : '',
        `Then open the pattern at:\n\n${open}\n`,
        'Beads and needles are small parts: keep them away from young children and pets.',
      ].join('\n'),
    );
    res.status(201).json({ tester: { id: tester.id, name: tester.name, email: tester.email }, created });
  });

  router.delete('/:id/invites/:userId', async (req, res) => {
    const { id, userId } = check(z.object({ id: idParam, userId: idParam }), req.params);
    const pattern = await ownPattern(models, auth(res), id);
    const removed = await models.Invitation.destroy({ where: { patternId: pattern.id, testerId: userId } });
    if (removed === 0) throw notFound('This tester is not invited to this pattern.');
    await models.Place.destroy({ where: { patternId: pattern.id, userId } });
    res.status(204).end();
  });

  return router;
}

/** Finds an active share link by its token (the only lookup that needs no sign-in). */
export async function sharedPatternId(deps: AppDeps, token: string): Promise<number> {
  if (!looksLikeToken(token)) throw notFound('This link is not valid.');
  const share = await deps.db.models.ShareLink.findOne({
    where: {
      tokenHash: hashToken(token),
      revokedAt: null,
      [Op.or]: [{ expiresAt: null }, { expiresAt: { [Op.gt]: new Date() } }],
    },
  });
  if (!share || !tokenMatches(token, share.tokenHash)) throw notFound('This link is not valid.');
  return share.patternId;
}
