/**
 * The AST with what formatting may change taken out: source ranges, where a
 * comment is attached (the comments themselves stay, in order), the row word
 * (`fmt` writes the one the layout implies) and the order and spelling of
 * header entries (their meaning stays in the typed header).
 */
import type { PatternAst } from '../../parser/index.js';

const POSITIONAL = new Set([
  'range',
  'keyRange',
  'valueRange',
  'colorRange',
  'numberRange',
  'leadingComments',
  'trailingComment',
  'headComments',
  'colorsComments',
  'tailComments',
  'word',
]);

function strip(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(strip);
  if (v === null || typeof v !== 'object') return v;
  return Object.fromEntries(
    Object.entries(v)
      .filter(([k]) => !POSITIONAL.has(k))
      .map(([k, x]) => [k, strip(x)]),
  );
}

export function normalise(ast: PatternAst): unknown {
  const { entries, ...header } = ast.header;
  return {
    ...(strip({ ...ast, header }) as object),
    entryKeys: entries.map((e) => e.key).sort(),
    comments: ast.comments.map((c) => c.text.trimEnd()),
  };
}
