/**
 * Who may see which pattern. Someone else's pattern, or one not shared with
 * a tester, is "not found", never "forbidden", so its existence stays hidden.
 */
import { col, fn, Op } from 'sequelize';
import type { Models } from './models/index.js';
import type { PatternInstance } from './models/pattern.js';
import type { VersionAttributes, VersionInstance } from './models/version.js';
import type { AuthContext } from './auth.js';
import { notFound } from './errors.js';
import type { Access, Sharing } from './serialize.js';

const noPattern = () => notFound('No such pattern.');

export async function visiblePattern(
  models: Models,
  ctx: AuthContext,
  id: number,
): Promise<{ pattern: PatternInstance; access: Access }> {
  const pattern = await models.Pattern.findByPk(id, { include: [{ model: models.User, as: 'owner' }] });
  if (!pattern) throw noPattern();
  const { user } = ctx;
  if (pattern.ownerId === user.id) return { pattern, access: 'owner' };
  if (user.role === 'admin') return { pattern, access: 'admin' };
  if (user.role === 'tester') {
    const invited = await models.Invitation.findOne({ where: { patternId: id, testerId: user.id } });
    if (invited) return { pattern, access: 'tester' };
  }
  throw noPattern();
}

/** Like visiblePattern, but only the owner gets through (others: 404). */
export async function ownPattern(models: Models, ctx: AuthContext, id: number): Promise<PatternInstance> {
  const { pattern, access } = await visiblePattern(models, ctx, id);
  if (access !== 'owner') throw noPattern();
  return pattern;
}

/** A version of the pattern (the current one by default), with its author unless only some `attributes` are asked for. */
export async function findVersion(
  models: Models,
  pattern: PatternInstance,
  number?: number,
  attributes?: (keyof VersionAttributes)[],
): Promise<VersionInstance> {
  const version = await models.Version.findOne({
    where: { patternId: pattern.id, number: number ?? pattern.currentVersion },
    ...(attributes ? { attributes } : { include: [{ model: models.User, as: 'author' }] }),
  });
  if (!version) throw notFound(`Version ${number} of this pattern does not exist.`);
  return version;
}

export async function sharingOf(models: Models, ids: number[]): Promise<Map<number, Sharing>> {
  const result = new Map<number, Sharing>(ids.map((id) => [id, { links: 0, testers: 0 }]));
  if (ids.length === 0) return result;
  const count = [fn('COUNT', col('id')), 'n'] as [ReturnType<typeof fn>, string];
  const [links, testers] = await Promise.all([
    models.ShareLink.findAll({
      attributes: ['patternId', count],
      where: {
        patternId: ids,
        revokedAt: null,
        [Op.or]: [{ expiresAt: null }, { expiresAt: { [Op.gt]: new Date() } }],
      },
      group: ['patternId'],
      raw: true,
    }),
    models.Invitation.findAll({
      attributes: ['patternId', count],
      where: { patternId: ids },
      group: ['patternId'],
      raw: true,
    }),
  ]);
  for (const row of links as unknown as { patternId: number; n: number }[])
    result.get(row.patternId)!.links = Number(row.n);
  for (const row of testers as unknown as { patternId: number; n: number }[])
    result.get(row.patternId)!.testers = Number(row.n);
  return result;
}
