/** Diagnostics (and the tally, once the engine has one) for text that is not saved. */
import { Router } from 'express';
import type { AppDeps } from '../context.js';
import { analyse } from '../engine.js';
import { hasErrors } from '../../shared/diagnostic.js';
import { acceptUploads, sourcesOf } from '../uploads.js';

export function checkRoutes(_deps: AppDeps): Router {
  const router = Router();
  router.post('/', acceptUploads, async (req, res) => {
    const files = await Promise.all(
      sourcesOf(req).map(async ({ name, source }) => {
        const analysis = await analyse(source);
        return {
          name,
          ok: !hasErrors(analysis.diagnostics),
          title: analysis.title,
          diagnostics: analysis.diagnostics,
          tally: analysis.tally,
        };
      }),
    );
    res.json({ files });
  });
  return router;
}
