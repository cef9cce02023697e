/**
 * Builds `PatternAst` values by hand for engine tests, so the engine is tested
 * on its own, apart from the parser. Rows are written as in a pattern file
 * (`*AAAA BA (AC CC)x2 +BBB`, `-` for a skip); each row sits on its own line.
 */
import type { ItemNode, Layout, KeyOrder, PatternAst, RowNode } from '../../parser/ast.js';
import type { SourceRange } from '../../shared/diagnostic.js';

const at = (line: number, column: number, length: number, offset: number): SourceRange => ({
  line,
  column,
  endLine: line,
  endColumn: column + length,
  offset,
  endOffset: offset + length,
});

function items(text: string, line: number, base: number, start: number, end: number): ItemNode[] {
  const out: ItemNode[] = [];
  let i = start;
  while (i < end) {
    const ch = text[i]!;
    if (ch === ' ') {
      i++;
    } else if (ch === '(') {
      let depth = 1;
      let k = i + 1;
      while (depth > 0) {
        if (text[k] === '(') depth++;
        if (text[k] === ')') depth--;
        k++;
      }
      const times = /^\s*x(\d+)/.exec(text.slice(k))!;
      const stop = k + times[0].length;
      out.push({
        type: 'group',
        items: items(text, line, base, i + 1, k - 1),
        times: Number(times[1]),
        range: at(line, i + 1, stop - i, base + i),
      });
      i = stop;
    } else if (ch === '-') {
      out.push({ type: 'skip', range: at(line, i + 1, 1, base + i) });
      i++;
    } else {
      let k = i;
      while (k < end && /[*+A-Z]/.test(text[k]!)) k++;
      const word = text.slice(i, k);
      const mark = word[0] === '*' || word[0] === '+' ? word[0] : '';
      out.push({ type: 'unit', mark, keys: word.slice(mark.length), range: at(line, i + 1, k - i, base + i) });
      i = k;
    }
  }
  return out;
}

export function pattern(layout: Layout, rows: readonly string[], order: KeyOrder = 'pickup'): PatternAst {
  let offset = 0;
  const rowNodes: RowNode[] = rows.map((text, r) => {
    const line = r + 1;
    const node: RowNode = {
      word: layout === 'flat' ? 'row' : 'round',
      from: line,
      to: line,
      items: items(text, line, offset, 0, text.length),
      notes: [],
      range: at(line, 1, text.length, offset),
      numberRange: at(line, 1, 1, offset),
      leadingComments: [],
    };
    offset += text.length + 1;
    return node;
  });
  const keys = new Set(rows.join('').replace(/[^A-Z]/g, ''));
  return {
    header: { title: 'Test piece', beads: { size: '11/0', shape: 'round' }, layout, order, entries: [] },
    colors: [...keys].sort().map((key, i) => ({
      key,
      written: `#${(i * 37 + 16).toString(16).padStart(2, '0').repeat(3)}`,
      hex: `#${(i * 37 + 16).toString(16).padStart(2, '0').repeat(3)}`,
      name: '',
      range: at(1, 1, 1, 0),
      keyRange: at(1, 1, 1, 0),
      colorRange: at(1, 1, 1, 0),
    })),
    notes: [],
    rows: rowNodes,
    comments: [],
  };
}

/** A flat panel n units wide and r rows high, all in colour A. */
export function panelRows(n: number, r: number): string[] {
  const rows = [['AAAA', ...Array<string>(n - 1).fill('AAA')].join(' ')];
  for (let k = 2; k <= r; k++) rows.push(['AAA', ...Array<string>(n - 1).fill('AA')].join(' '));
  return rows;
}

/** A tube c units round and r rows high. */
export function tubeRows(c: number, r: number): string[] {
  const rows = [['AAAA', ...Array<string>(c - 2).fill('AAA'), 'AA'].join(' ')];
  for (let k = 2; k <= r; k++) rows.push(['AAA', ...Array<string>(c - 2).fill('AA'), 'A'].join(' '));
  return rows;
}

/** The growing fan: one unit, then a fresh ring and an increase on every later row (row k has 2k - 1 units). */
export function fanRows(R: number): string[] {
  const rows = ['AAAA'];
  for (let k = 2; k <= R; k++) rows.push(['*AAAA', ...Array<string>(2 * k - 3).fill('AA'), '+AAA'].join(' '));
  return rows;
}
