import { Router } from 'express';
import { z } from 'zod';
import type { AppDeps } from '../context.js';
import { allow, auth } from '../auth.js';
import { findVersion, ownPattern, sharingOf, visiblePattern } from '../access.js';
import { listPatterns } from '../library.js';
import { toDetail, toSummary, toVersion } from '../serialize.js';
import { acceptUploads, sourcesOf } from '../uploads.js';
import { addVersion, createPatterns } from '../versions.js';
import { check, idParams, pageQuery, versionQuery } from '../validate.js';

const listQuery = z.object({
  q: z.string().trim().max(200).optional(),
  sort: z.enum(['updated', 'title', 'beads']).default('updated'),
  dir: z.enum(['asc', 'desc']).optional(),
  ...pageQuery,
});

export function patternRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const { models } = db;
  const router = Router();

  router.get('/', async (req, res) => {
    const query = check(listQuery, req.query);
    res.json(await listPatterns(db, auth(res), query));
  });

  router.post('/', allow('designer'), acceptUploads, async (req, res) => {
    const { user } = auth(res);
    const created = await createPatterns(db, user, sourcesOf(req));
    const items = created.map(({ pattern, analysis }) => ({
      ...toSummary(Object.assign(pattern, { owner: user }), { links: 0, testers: 0 }),
      diagnostics: analysis.diagnostics,
    }));
    res.status(201).json({ items });
  });

  router.get('/:id', async (req, res) => {
    const { id } = check(idParams, req.params);
    const { version } = check(versionQuery, req.query);
    const { pattern, access } = await visiblePattern(models, auth(res), id);
    const shown = await findVersion(models, pattern, version);
    const sharing = await sharingOf(models, [id]);
    res.json(toDetail(pattern, shown, sharing.get(id)!, access));
  });

  router.put('/:id', allow('designer'), async (req, res) => {
    const { id } = check(idParams, req.params);
    const ctx = auth(res);
    const pattern = await ownPattern(models, ctx, id);
    const { source } = sourcesOf(req)[0]!;
    const { created } = await addVersion(db, pattern, ctx.user, source);
    await pattern.reload({ include: [{ model: models.User, as: 'owner' }] });
    const shown = await findVersion(models, pattern);
    const sharing = await sharingOf(models, [id]);
    res.json({ created, pattern: toDetail(pattern, shown, sharing.get(id)!, 'owner') });
  });

  router.delete('/:id', allow('designer'), async (req, res) => {
    const { id } = check(idParams, req.params);
    const pattern = await ownPattern(models, auth(res), id);
    await pattern.destroy();
    res.status(204).end();
  });

  router.get('/:id/versions', async (req, res) => {
    const { id } = check(idParams, req.params);
    const { pattern } = await visiblePattern(models, auth(res), id);
    const versions = await models.Version.findAll({
      where: { patternId: pattern.id },
      attributes: ['number', 'contentHash', 'createdAt', 'diagnostics', 'authorId'],
      include: [{ model: models.User, as: 'author', attributes: ['id', 'name'] }],
      order: [['number', 'DESC']],
    });
    res.json({ items: versions.map(toVersion) });
  });

  return router;
}
