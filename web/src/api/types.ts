/**
 * The shapes the viewer API sends (docs/server.md). Only what the app reads
 * is listed; the server may send more.
 */
import type { Diagnostic } from '../../../shared/diagnostic.js';
import type { PaletteEntry } from '../../../shared/model.js';
import type { Layout } from '../../../parser/ast.js';

export type Role = 'admin' | 'designer' | 'tester';

export interface User {
  id: number;
  name: string;
  email: string;
  role: Role;
  createdAt?: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export interface Person {
  id: number;
  name: string;
}

export interface PatternSummary {
  id: number;
  title: string;
  layout: Layout;
  rows: number;
  /** null when the engine could not build a model. */
  units: number | null;
  beads: number | null;
  colors: PaletteEntry[];
  version: number;
  errors: number;
  warnings: number;
  owner: Person;
  sharing: { links: number; testers: number };
  createdAt: string;
  updatedAt: string;
}

export interface PatternDetail extends PatternSummary {
  source: string;
  diagnostics: Diagnostic[];
  viewing: { version: number; createdAt: string; author: Person };
  can: { edit: boolean; share: boolean; feedback: boolean; resolve: boolean };
}

export interface VersionInfo {
  number: number;
  contentHash: string;
  createdAt: string;
  author: Person;
  errors: number;
  warnings: number;
}

export interface CheckedFile {
  name: string;
  ok: boolean;
  title: string;
  diagnostics: Diagnostic[];
  tally: TallyJson | null;
}

export type UploadedItem = PatternSummary & { diagnostics: Diagnostic[] };

export interface TallyJson {
  schema: 'fourfold.tally/1';
  title: string;
  beads: number;
  units: number;
  rows: { row: number; units: number; beads: number }[];
  colors: {
    key: string;
    name: string;
    hex: string;
    count: number;
    grams: { low: number; high: number };
    buyGrams: number;
  }[];
  spare: number;
  thread: { mm: number; threads: number };
  size: { widthMm: number; heightMm: number };
}

export interface ShareLink {
  id: number;
  createdAt: string;
  expiresAt: string | null;
  revoked: boolean;
  active: boolean;
}

export interface Access {
  shares: ShareLink[];
  testers: { id: number; name: string; email: string; invitedAt: string }[];
}

export interface FeedbackNote {
  id: number;
  version: number;
  row: number;
  unit: number | null;
  text: string;
  status: 'open' | 'resolved';
  author: Person;
  createdAt: string;
  resolvedAt: string | null;
}

export interface Place {
  row: number | null;
  unit: number | null;
}

export interface AccessToken {
  id: number;
  name: string;
  createdAt: string;
  lastUsedAt: string | null;
  expiresAt: string | null;
}

export interface OutboxMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  date: string;
}
