/**
 * The demo studio, made on first start outside production: three invented
 * people and the example patterns as the designer's own.
 */
import { readdir, readFile } from 'node:fs/promises';
import { join, relative } from 'node:path';
import type { Db } from './db/connect.js';
import { hashPassword } from './passwords.js';
import { decodeText, MAX_FILE_BYTES, type Source } from './uploads.js';
import { createPatterns } from './versions.js';

export const DEMO_ACCOUNTS = [
  { name: 'Odile Ferrancourt', email: 'admin@example.com', role: 'admin' },
  { name: 'Ines Marlow', email: 'designer@example.com', role: 'designer' },
  { name: 'Tobiah Renwick', email: 'tester@example.com', role: 'tester' },
] as const;

export const DEFAULT_DEMO_PASSWORD = 'fourfold-demo';

/** Every `.ffp` file under `dir`, in a stable order; files that are too large or not text are left out. */
export async function readExamples(dir: string): Promise<Source[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true }).catch(() => []);
  const files = entries
    .filter((e) => e.isFile() && e.name.endsWith('.ffp'))
    .map((e) => join(e.parentPath, e.name))
    .sort();
  const sources: Source[] = [];
  for (const file of files) {
    const bytes = await readFile(file);
    if (bytes.length > MAX_FILE_BYTES) continue;
    try {
      sources.push({ name: relative(dir, file), source: decodeText(file, bytes) });
    } catch {
      continue;
    }
  }
  return sources;
}

/** Seeds an empty database; returns false (and changes nothing) when any account exists. */
export async function seedDemo(db: Db, options: { password: string; examplesDir?: string }): Promise<boolean> {
  const { User, Invitation, Feedback } = db.models;
  if ((await User.count()) > 0) return false;
  const passwordHash = await hashPassword(options.password);
  const [, designer, tester] = await Promise.all(DEMO_ACCOUNTS.map((a) => User.create({ ...a, passwordHash })));
  const sources = options.examplesDir ? await readExamples(options.examplesDir) : [];
  if (sources.length === 0) return true;
  const created = await createPatterns(db, designer!, sources);
  // The tester has the first two patterns to work on, with one note already left.
  for (const { pattern } of created.slice(0, 2)) {
    await Invitation.create({ patternId: pattern.id, testerId: tester!.id, invitedById: designer!.id });
  }
  const first = created[0]!.pattern;
  if (first.rows > 0) {
    await Feedback.create({
      patternId: first.id,
      version: 1,
      row: 1,
      unit: null,
      authorId: tester!.id,
      text: 'Row 1 went smoothly; I used a stop bead to keep the tension.',
    });
  }
  return true;
}
