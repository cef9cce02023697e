/**
 * The canonical layout `fourfold fmt` writes: header keys in a fixed order
 * with aligned values, pattern notes, an aligned colour table, one row a line
 * (continuation lines joined), groups kept as written with normalised
 * spacing, and every comment and note kept with the line it belongs to.
 * Formatting a formatted file gives the same text.
 */
import type { ColorDef, Comment, HeaderEntry, ItemNode, NoteNode, PatternAst, RowNode } from './ast.js';
import { BEAD_SIZES, HEADER_KEYS, LAYOUTS, normaliseBeads, ORDERS } from './values.js';

export function format(ast: PatternAst): string {
  const blocks: string[][] = [];
  // The file's own comments stand directly above the header, as in a hand-written file.
  const head = (ast.headComments ?? []).map(commentLine);
  const entries = orderEntries(ast.header.entries);
  const width = Math.max(0, ...entries.map((e) => e.key.length + 2));
  const header = [...head, ...entries.flatMap((e) => [...comments(e.leadingComments), headerLine(e, width)])];
  if (header.length > 0) blocks.push(header);
  if (ast.notes.length > 0) blocks.push(ast.notes.flatMap(noteLines));
  if (ast.colors.length > 0 || ast.colorsComments?.length)
    blocks.push([...comments(ast.colorsComments), 'colors:', ...colorTable(ast.colors)]);

  const word = ast.header.layout === 'flat' ? 'row' : 'round';
  let rows: string[] = [];
  for (const row of ast.rows) {
    if (row.leadingComments.length > 0 && rows.length > 0) {
      blocks.push(rows);
      rows = [];
    }
    rows.push(...comments(row.leadingComments), rowLine(row, word), ...row.notes.flatMap(noteLines));
  }
  if (rows.length > 0) blocks.push(rows);
  if (ast.tailComments?.length) blocks.push(ast.tailComments.map(commentLine));
  return blocks.map((b) => b.join('\n')).join('\n\n') + '\n';
}

const commentLine = (c: Comment): string => `#${c.text.trimEnd()}`;
const comments = (list: Comment[] | undefined, indent = ''): string[] =>
  (list ?? []).map((c) => indent + commentLine(c));

/** Known keys in the documented order (a repeated key stays after its first), then the others as written. */
function orderEntries(entries: HeaderEntry[]): HeaderEntry[] {
  const rank = (e: HeaderEntry): number => {
    const i = (HEADER_KEYS as readonly string[]).indexOf(e.key);
    return i === -1 ? HEADER_KEYS.length : i;
  };
  return entries
    .map((e, i) => ({ e, i }))
    .sort((a, b) => rank(a.e) - rank(b.e) || a.i - b.i)
    .map(({ e }) => e);
}

function headerLine(e: HeaderEntry, width: number): string {
  const value = canonicalValue(e);
  return value === '' ? `${e.key}:` : `${`${e.key}:`.padEnd(width)}${value}`;
}

/** Values with a fixed vocabulary are written the one way they are documented; free text as written. */
function canonicalValue(e: HeaderEntry): string {
  const lower = e.value.toLowerCase();
  if (e.key === 'beads' && (BEAD_SIZES as readonly string[]).includes(normaliseBeads(e.value)))
    return normaliseBeads(e.value);
  if (e.key === 'layout' && (LAYOUTS as readonly string[]).includes(lower)) return lower;
  if (e.key === 'order' && (ORDERS as readonly string[]).includes(lower)) return lower;
  return e.value;
}

const noteLines = (n: NoteNode): string[] => [
  ...comments(n.leadingComments),
  n.text === '' ? 'note:' : `note: ${n.text}`,
];

function colorTable(colors: ColorDef[]): string[] {
  const width = Math.max(0, ...colors.map((c) => [...c.written].length));
  return colors.flatMap((c) => {
    const line =
      c.name === ''
        ? `  ${c.key}  ${c.written}`
        : `  ${c.key}  ${c.written.padEnd(width + (c.written.length - [...c.written].length))}  ${c.name}`;
    return [...comments(c.leadingComments, '  '), line];
  });
}

function rowLine(row: RowNode, word: string): string {
  const label = row.from === row.to ? `${word} ${row.from}` : `${word}s ${row.from}-${row.to}`;
  const items = itemsText(row.items);
  const line = items === '' ? `${label}:` : `${label}: ${items}`;
  return row.trailingComment ? `${line}  ${commentLine(row.trailingComment)}` : line;
}

export function itemsText(items: readonly ItemNode[]): string {
  return items
    .map((item) =>
      item.type === 'unit'
        ? item.mark + item.keys
        : item.type === 'skip'
          ? '-'
          : `(${itemsText(item.items)})x${item.times}`,
    )
    .join(' ');
}
