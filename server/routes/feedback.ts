/** Testers' feedback on a row or unit, and each user's place in the stepper. */
import { Router } from 'express';
import { z } from 'zod';
import type { AppDeps } from '../context.js';
import { allow, auth } from '../auth.js';
import { findVersion, ownPattern, visiblePattern } from '../access.js';
import { HttpError, notFound } from '../errors.js';
import type { Model } from '../../shared/model.js';
import { toFeedback } from '../serialize.js';
import { check, idParam, idParams, versionQuery } from '../validate.js';

const position = { row: z.number().int().min(1).max(1_000_000), unit: z.number().int().min(1).max(1_000_000) };
const feedbackBody = z.object({
  ...position,
  unit: position.unit.optional(),
  text: z.string().trim().min(1).max(4000),
  version: idParam.optional(),
});

/** Units per row of a stored model, or null when the version has no model (then every row counts as present). */
function rowSizes(modelJson: string | null): Map<number, number> | null {
  if (!modelJson) return null;
  const model = JSON.parse(modelJson) as Model;
  return new Map(model.rows.map((r) => [r.row, r.units.length]));
}

const exists = (sizes: Map<number, number> | null, row: number, unit: number | null): boolean =>
  sizes === null || (sizes.has(row) && (unit === null || unit <= sizes.get(row)!));

export function feedbackRoutes(deps: AppDeps): Router {
  const { models } = deps.db;
  const router = Router();
  const include = [{ model: models.User, as: 'author', attributes: ['id', 'name'] }];

  router.get('/:id/feedback', async (req, res) => {
    const { id } = check(idParams, req.params);
    const { version } = check(versionQuery, req.query);
    const { pattern } = await visiblePattern(models, auth(res), id);
    const shown = await findVersion(models, pattern, version);
    const sizes = rowSizes(shown.model);
    const notes = await models.Feedback.findAll({
      where: { patternId: id },
      include,
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
    });
    // A note shows on its own version and later ones while its row (and unit) still exist.
    const items = notes.filter((n) => n.version <= shown.number && exists(sizes, n.row, n.unit)).map(toFeedback);
    res.json({ items });
  });

  router.post('/:id/feedback', allow('designer', 'tester'), async (req, res) => {
    const { id } = check(idParams, req.params);
    const body = check(feedbackBody, req.body);
    const ctx = auth(res);
    const { pattern } = await visiblePattern(models, ctx, id);
    const shown = await findVersion(models, pattern, body.version);
    if (!exists(rowSizes(shown.model), body.row, body.unit ?? null)) {
      throw new HttpError(
        400,
        'invalid-input',
        `Version ${shown.number} has no row ${body.row}${body.unit ? `, unit ${body.unit}` : ''}.`,
      );
    }
    const note = await models.Feedback.create({
      patternId: id,
      version: shown.number,
      row: body.row,
      unit: body.unit ?? null,
      authorId: ctx.user.id,
      text: body.text,
    });
    await note.reload({ include });
    res.status(201).json(toFeedback(note));
  });

  router.patch('/:id/feedback/:feedbackId', allow('designer'), async (req, res) => {
    const { id, feedbackId } = check(z.object({ id: idParam, feedbackId: idParam }), req.params);
    const { status } = check(z.object({ status: z.enum(['open', 'resolved']) }), req.body);
    const pattern = await ownPattern(models, auth(res), id);
    const note = await models.Feedback.findOne({ where: { id: feedbackId, patternId: pattern.id }, include });
    if (!note) throw notFound('No such feedback.');
    await note.update({ status, resolvedAt: status === 'resolved' ? new Date() : null });
    res.json(toFeedback(note));
  });

  router.get('/:id/place', async (req, res) => {
    const { id } = check(idParams, req.params);
    const ctx = auth(res);
    await visiblePattern(models, ctx, id);
    const place = await models.Place.findOne({ where: { patternId: id, userId: ctx.user.id } });
    res.json({ row: place?.row ?? null, unit: place?.unit ?? null });
  });

  router.put('/:id/place', allow('designer', 'tester'), async (req, res) => {
    const { id } = check(idParams, req.params);
    const body = check(z.object(position), req.body);
    const ctx = auth(res);
    await visiblePattern(models, ctx, id);
    const [place] = await models.Place.findOrCreate({
      where: { patternId: id, userId: ctx.user.id },
      defaults: { patternId: id, userId: ctx.user.id, ...body },
    });
    await place.update(body);
    res.json({ row: place.row, unit: place.unit });
  });

  return router;
}
