/** Rows to the JSON shapes of docs/server.md. */
import type { FeedbackInstance } from './models/feedback.js';
import type { PatternAttributes, PatternInstance } from './models/pattern.js';
import type { UserInstance } from './models/user.js';
import type { VersionInstance } from './models/version.js';
import { countSeverity } from './engine.js';

/** ISO 8601; text is already that (the library query formats its dates in SQL). */
const iso = (d: Date | string | null | undefined): string | null =>
  typeof d === 'string' ? d : d ? d.toISOString() : null;
const person = (u: { id: number; name: string } | null | undefined) =>
  u ? { id: u.id, name: u.name } : { id: 0, name: 'Former member' };

export const toUser = (u: UserInstance) => ({
  id: u.id,
  name: u.name,
  email: u.email,
  role: u.role,
  createdAt: iso(u.createdAt),
});

export interface Sharing {
  links: number;
  testers: number;
}

/** A pattern row with its owner's id and name (an instance with `owner` included, or a plain row). */
export type PatternRow = Omit<PatternAttributes, 'ownerId' | 'createdAt' | 'updatedAt'> & {
  createdAt: Date | string;
  updatedAt: Date | string;
  owner?: { id: number; name: string } | null;
};

export function toSummary(p: PatternRow, sharing: Sharing) {
  const owner = p.owner;
  return {
    id: p.id,
    title: p.title,
    layout: p.layout,
    rows: p.rows,
    units: p.units,
    beads: p.beads,
    colors: p.colors,
    version: p.currentVersion,
    errors: p.errors,
    warnings: p.warnings,
    owner: person(owner),
    sharing,
    createdAt: iso(p.createdAt),
    updatedAt: iso(p.updatedAt),
  };
}

export type Access = 'owner' | 'tester' | 'admin' | 'share';

export function toDetail(p: PatternInstance, v: VersionInstance, sharing: Sharing, access: Access) {
  const author = (v as VersionInstance & { author?: UserInstance }).author;
  return {
    ...toSummary(p, sharing),
    source: v.source,
    diagnostics: v.diagnostics,
    viewing: { version: v.number, createdAt: iso(v.createdAt), author: person(author) },
    can: {
      edit: access === 'owner',
      share: access === 'owner',
      feedback: access === 'owner' || access === 'tester',
      resolve: access === 'owner',
    },
  };
}

export function toVersion(v: VersionInstance) {
  const author = (v as VersionInstance & { author?: UserInstance }).author;
  return {
    number: v.number,
    contentHash: v.contentHash,
    createdAt: iso(v.createdAt),
    author: person(author),
    errors: countSeverity(v.diagnostics, 'error'),
    warnings: countSeverity(v.diagnostics, 'warning'),
  };
}

export function toFeedback(f: FeedbackInstance) {
  const author = (f as FeedbackInstance & { author?: UserInstance }).author;
  return {
    id: f.id,
    version: f.version,
    row: f.row,
    unit: f.unit,
    text: f.text,
    status: f.status,
    author: person(author),
    createdAt: iso(f.createdAt),
    resolvedAt: iso(f.resolvedAt),
  };
}
