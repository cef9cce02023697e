/**
 * The library page: one hand-written query that brings the rows of a page
 * and the total together (a second query only for a page past the end). It
 * is the most requested read, so it skips the ORM's instance building and
 * makes one round trip; every value still goes in as a bound parameter.
 */
import { QueryTypes } from 'sequelize';
import type { AuthContext } from './auth.js';
import type { Db } from './db/connect.js';
import type { PatternColor } from './models/pattern.js';
import { toSummary } from './serialize.js';

export interface LibraryQuery {
  q?: string;
  sort: 'updated' | 'title' | 'beads';
  dir?: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

interface Row {
  id: number;
  title: string;
  layout: string;
  rows: number;
  units: number | null;
  beads: number | null;
  colors: PatternColor[] | string;
  currentVersion: number;
  errors: number;
  warnings: number;
  createdAt: string;
  updatedAt: string;
  ownerId: number;
  ownerName: string;
  links: number | bigint;
  testers: number | bigint;
  total: number | bigint;
}

const SORT_COLUMN = { updated: 'p.updatedAt', title: 'p.title', beads: 'p.beads' } as const;
/**
 * A DATETIME (whole seconds, stored as UTC) as the ISO 8601 text the API
 * sends, made by the server: parsing a date per column and row only to print
 * it again was the page's largest cost per row.
 */
const isoOf = (column: string) => `DATE_FORMAT(${column}, '%Y-%m-%dT%H:%i:%s.000Z')`;
const likeEscape = (text: string): string => text.replace(/[\\%_]/g, (c) => `\\${c}`);

/** Own patterns for a designer, invited ones for a tester, all for an admin: the one SQL form of the rule in access.ts. */
export function visibility(ctx: AuthContext): { sql: string; params: unknown[] } {
  const { role, id } = ctx.user;
  if (role === 'admin') return { sql: '1 = 1', params: [] };
  if (role === 'designer') return { sql: 'p.ownerId = ?', params: [id] };
  return { sql: 'p.id IN (SELECT i.patternId FROM invitations i WHERE i.testerId = ?)', params: [id] };
}

export async function listPatterns(db: Db, ctx: AuthContext, query: LibraryQuery) {
  const seen = visibility(ctx);
  const where = [seen.sql, ...(query.q ? ['p.title LIKE ?'] : [])].join(' AND ');
  const params = [...seen.params, ...(query.q ? [`%${likeEscape(query.q)}%`] : [])];
  const dir = (query.dir ?? (query.sort === 'title' ? 'asc' : 'desc')) === 'asc' ? 'ASC' : 'DESC';
  const count = `SELECT COUNT(*) AS n FROM patterns p WHERE ${where}`;
  // The total is an uncorrelated subquery, which the server works out once per query, not once per row.
  const page = `
    SELECT (${count}) AS total, p.id, p.title, p.layout, p.rows, p.units, p.beads, p.colors, p.currentVersion, p.errors, p.warnings,
           ${isoOf('p.createdAt')} AS createdAt, ${isoOf('p.updatedAt')} AS updatedAt, p.ownerId, u.name AS ownerName,
           (SELECT COUNT(*) FROM share_links s WHERE s.patternId = p.id AND s.revokedAt IS NULL
              AND (s.expiresAt IS NULL OR s.expiresAt > UTC_TIMESTAMP())) AS links,
           (SELECT COUNT(*) FROM invitations i2 WHERE i2.patternId = p.id) AS testers
    FROM patterns p
    JOIN users u ON u.id = p.ownerId
    WHERE ${where}
    ORDER BY ${SORT_COLUMN[query.sort]} ${dir}, p.id ${dir}
    LIMIT ? OFFSET ?`;
  const rows = await db.sequelize.query<Row>(page, {
    replacements: [...params, ...params, query.pageSize, (query.page - 1) * query.pageSize],
    type: QueryTypes.SELECT,
    raw: true,
  });
  const total = rows[0]
    ? rows[0].total
    : (
        await db.sequelize.query<{ n: number | bigint }>(count, {
          replacements: params,
          type: QueryTypes.SELECT,
          raw: true,
        })
      )[0]?.n;
  const items = rows.map((r) =>
    toSummary(
      {
        ...r,
        colors: typeof r.colors === 'string' ? (JSON.parse(r.colors) as PatternColor[]) : r.colors,
        owner: { id: r.ownerId, name: r.ownerName },
      },
      { links: Number(r.links), testers: Number(r.testers) },
    ),
  );
  return { items, total: Number(total ?? 0), page: query.page, pageSize: query.pageSize };
}

/**
 * The id of a version the caller may see (the current one unless `number` is
 * given), in one query: what the chart and other views need before anything
 * is rendered. `ctx` null means the pattern came from a valid share link.
 */
export async function viewableVersionId(
  db: Db,
  ctx: AuthContext | null,
  patternId: number,
  number?: number,
): Promise<number | null> {
  const seen = ctx ? visibility(ctx) : { sql: '1 = 1', params: [] };
  const rows = await db.sequelize.query<{ id: number }>(
    `SELECT v.id FROM patterns p JOIN versions v ON v.patternId = p.id AND v.number = COALESCE(?, p.currentVersion)
     WHERE p.id = ? AND (${seen.sql})`,
    { replacements: [number ?? null, patternId, ...seen.params], type: QueryTypes.SELECT, raw: true },
  );
  return rows[0]?.id ?? null;
}
