/**
 * Writing patterns and versions. The engine runs first (no transaction held
 * while it computes); then each request's rows are written in one
 * transaction, so a failed upload leaves nothing behind.
 */
import type { Transaction } from 'sequelize';
import type { Db } from './db/connect.js';
import type { PatternAttributes, PatternInstance } from './models/pattern.js';
import type { UserInstance } from './models/user.js';
import { analyse, contentHash, countSeverity, type Analysis } from './engine.js';
import type { Source } from './uploads.js';

const patternFields = (
  a: Analysis,
): Omit<PatternAttributes, 'id' | 'ownerId' | 'currentVersion' | 'createdAt' | 'updatedAt'> => ({
  title: a.title.slice(0, 300),
  layout: a.layout,
  rows: a.rows,
  units: a.units,
  beads: a.beads,
  colors: a.colors,
  errors: countSeverity(a.diagnostics, 'error'),
  warnings: countSeverity(a.diagnostics, 'warning'),
});

const versionFields = (a: Analysis, source: string) => ({
  source,
  model: a.modelJson,
  diagnostics: a.diagnostics,
  contentHash: contentHash(source),
});

export interface Created {
  pattern: PatternInstance;
  analysis: Analysis;
}

export async function createPatterns(db: Db, owner: UserInstance, sources: Source[]): Promise<Created[]> {
  const analyses = await Promise.all(sources.map((s) => analyse(s.source)));
  const { Pattern, Version } = db.models;
  return db.sequelize.transaction(async (transaction) => {
    const created: Created[] = [];
    for (const [i, analysis] of analyses.entries()) {
      const pattern = await Pattern.create(
        { ownerId: owner.id, currentVersion: 1, ...patternFields(analysis) },
        { transaction },
      );
      await Version.create(
        { patternId: pattern.id, number: 1, authorId: owner.id, ...versionFields(analysis, sources[i]!.source) },
        { transaction },
      );
      created.push({ pattern, analysis });
    }
    return created;
  });
}

/** A new version unless the text equals the current version's (then `created` is false). */
export async function addVersion(
  db: Db,
  pattern: PatternInstance,
  author: UserInstance,
  source: string,
): Promise<{ created: boolean; version: number }> {
  const { Pattern, Version } = db.models;
  const hash = contentHash(source);
  const sameAs = async (number: number, transaction?: Transaction) =>
    (await Version.findOne({ where: { patternId: pattern.id, number }, attributes: ['contentHash'], transaction }))
      ?.contentHash === hash;
  // Cheap check first, so an unchanged push does not run the engine.
  if (await sameAs(pattern.currentVersion)) return { created: false, version: pattern.currentVersion };
  const analysis = await analyse(source);
  return db.sequelize.transaction(async (transaction) => {
    // Lock the pattern row so two saves at once get consecutive numbers, and look again under the lock.
    const locked = await Pattern.findByPk(pattern.id, { transaction, lock: transaction.LOCK.UPDATE });
    const current = locked?.currentVersion ?? pattern.currentVersion;
    if (await sameAs(current, transaction)) return { created: false, version: current };
    const number = current + 1;
    await Version.create(
      { patternId: pattern.id, number, authorId: author.id, ...versionFields(analysis, source) },
      { transaction },
    );
    await pattern.update({ currentVersion: number, ...patternFields(analysis) }, { transaction });
    return { created: true, version: number };
  });
}
