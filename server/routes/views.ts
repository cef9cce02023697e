/**
 * The derived views of one version (chart, tally, steps, kit, model), for a
 * signed-in viewer and, without sign-in, for a valid share link.
 */
import { Router, type Response } from 'express';
import { z } from 'zod';
import type { AppDeps } from '../context.js';
import { auth, type AuthContext } from '../auth.js';
import { findVersion, sharingOf } from '../access.js';
import { notFound } from '../errors.js';
import { viewableVersionId } from '../library.js';
import type { Model } from '../../shared/model.js';
import type { Render, ViewKind } from '../render.js';
import { toDetail } from '../serialize.js';
import { check, idParams, versionQuery } from '../validate.js';
import { sharedPatternId } from './sharing.js';

const VIEWS: ViewKind[] = ['chart.svg', 'chart.png', 'tally', 'steps', 'kit', 'model'];
const SHARED_VIEWS: ViewKind[] = ['chart.svg', 'chart.png', 'tally', 'steps'];
const sharedParams = z.object({ token: z.string().max(100) });

/**
 * Sends one view. A pattern the caller may not see and a version that does
 * not exist are both 404; the model is read only when the view is not cached.
 */
async function send(
  res: Response,
  deps: AppDeps,
  render: Render,
  ctx: AuthContext | null,
  patternId: number,
  kind: ViewKind,
  query: Record<string, unknown>,
) {
  const { version } = check(versionQuery, { version: query.version });
  const versionId = await viewableVersionId(deps.db, ctx, patternId, version);
  if (versionId === null) throw notFound(version ? 'No such pattern or version.' : 'No such pattern.');
  const loadModel = async () => {
    const row = await deps.db.models.Version.findByPk(versionId, { attributes: ['model'] });
    return row?.model ? (JSON.parse(row.model) as Model) : null;
  };
  const out = await render(kind, versionId, loadModel, query);
  if (/^(image\/svg|text\/html)/.test(out.type)) {
    // A chart or a printable page is shown, never a document that may run script with the API's rights.
    res.setHeader('Content-Security-Policy', 'sandbox');
  }
  res.setHeader('X-Content-Type-Options', 'nosniff');
  if (out.etag) res.setHeader('ETag', out.etag);
  res.type(out.type).send(out.body);
}

export function viewRoutes(deps: AppDeps, render: Render): Router {
  const router = Router();
  for (const kind of VIEWS) {
    router.get(`/:id/${kind}`, async (req, res) => {
      const { id } = check(idParams, req.params);
      await send(res, deps, render, auth(res), id, kind, req.query as Record<string, unknown>);
    });
  }
  return router;
}

export function sharedRoutes(deps: AppDeps, render: Render): Router {
  const { models } = deps.db;
  const router = Router();
  const sharedPattern = async (token: string) => {
    const id = await sharedPatternId(deps, token);
    return (await models.Pattern.findByPk(id, { include: [{ model: models.User, as: 'owner' }] }))!;
  };
  router.get('/:token', async (req, res) => {
    const { token } = check(sharedParams, req.params);
    const pattern = await sharedPattern(token);
    const shown = await findVersion(models, pattern);
    const sharing = await sharingOf(models, [pattern.id]);
    res.json(toDetail(pattern, shown, sharing.get(pattern.id)!, 'share'));
  });
  for (const kind of SHARED_VIEWS) {
    router.get(`/:token/${kind}`, async (req, res) => {
      const { token } = check(sharedParams, req.params);
      await send(
        res,
        deps,
        render,
        null,
        await sharedPatternId(deps, token),
        kind,
        req.query as Record<string, unknown>,
      );
    });
  }
  return router;
}
