/**
 * CST to AST: a Chevrotain visitor that turns each line into a node with a
 * source range, then places the lines (header, colours, notes, rows) and
 * attaches comments. Problems only the shape of a line shows (a missing row
 * number or ':', an unclosed group, a lower-case key) are reported here.
 */
import type { CstElement, CstNode, IToken } from 'chevrotain';
import type { SourceRange } from '../shared/diagnostic.js';
import type { ColorDef, Comment, GroupNode, HeaderEntry, ItemNode, NoteNode, PatternAst, RowNode } from './ast.js';
import { parser } from './grammar.js';
import type { LineIndex } from './positions.js';
import { DiagnosticList } from './limits.js';
import { didYouMean, suggest } from './suggest.js';
import { badColor, colorHex, COLORS_KEYS, HEADER_KEYS, NOTE_KEY, readHeader, ROW_WORDS } from './values.js';

type Children = Record<string, CstElement[] | undefined>;

interface KeyLine {
  kind: 'key';
  key: string;
  keyRange: SourceRange;
  value: string;
  valueRange: SourceRange;
  range: SourceRange;
}
interface ColorLine {
  kind: 'color';
  word: string;
  wordRange: SourceRange;
  text: string;
  textOffset: number;
  range: SourceRange;
}
interface RowLine {
  kind: 'row';
  row: RowNode;
  /** Where the line's content ends (its newline), to tell trailing comments from leading ones. */
  end: number;
}
type Line = KeyLine | ColorLine | RowLine;

/** Shared by every absent child list, so a missing one allocates nothing. */
const NONE: readonly never[] = [];
/** One past the token's last code unit. */
const endOf = (t: IToken): number => t.startOffset + t.image.length;
const tokens = (ctx: Children, name: string): readonly IToken[] => (ctx[name] as IToken[] | undefined) ?? NONE;
const nodes = (ctx: Children, name: string): readonly CstNode[] => (ctx[name] as CstNode[] | undefined) ?? NONE;
/** Tokens inserted by error recovery have no text behind them. */
const real = (t: IToken | undefined): t is IToken =>
  t !== undefined && !t.isInsertedInRecovery && !Number.isNaN(t.startOffset);

const BaseVisitor = parser.getBaseCstVisitorConstructor();

class AstBuilder extends BaseVisitor {
  readonly diagnostics = new DiagnosticList();
  private readonly keyStrings = new Map<number, string>();

  constructor(private readonly ix: LineIndex) {
    super();
    this.validateVisitor();
  }

  private range(t: IToken): SourceRange {
    return this.ix.range(t.startOffset, endOf(t));
  }

  private error(range: SourceRange, message: string, hint?: string, id = 'syntax'): void {
    if (this.diagnostics.full) {
      this.diagnostics.dropped++;
      return;
    }
    this.diagnostics.push(
      hint === undefined ? { severity: 'error', id, message, range } : { severity: 'error', id, message, range, hint },
    );
  }

  pattern(ctx: Children): Line[] {
    const text = nodes(ctx, 'textLine');
    const rows = nodes(ctx, 'rowLine');
    const all = text.length === 0 || rows.length === 0 ? [...text, ...rows] : mergeByOffset(text, rows);
    const lines: Line[] = [];
    for (const n of all) {
      const line = this.visit(n) as Line | undefined;
      if (line) lines.push(line);
    }
    return lines;
  }

  textLine(ctx: Children): Line | undefined {
    const head = tokens(ctx, 'HeaderKey')[0] ?? tokens(ctx, 'ColorKey')[0];
    if (!real(head)) return undefined;
    const textTok = tokens(ctx, 'Text')[0];
    const raw = real(textTok) ? textTok.image : '';
    const textOffset = real(textTok) ? textTok.startOffset : endOf(head);
    const lineEnd = textOffset + raw.length;
    const range = this.ix.range(head.startOffset, lineEnd - (raw.length - raw.trimEnd().length));
    if (head.tokenType.name === 'ColorKey') {
      return { kind: 'color', word: head.image, wordRange: this.range(head), text: raw, textOffset, range };
    }
    const key = head.image.slice(0, -1).trim();
    const lead = raw.length - raw.trimStart().length;
    const value = raw.trim();
    return {
      kind: 'key',
      key: key.toLowerCase(),
      keyRange: this.ix.range(head.startOffset, head.startOffset + key.length),
      value,
      valueRange: this.ix.range(textOffset + lead, textOffset + lead + value.length),
      range,
    };
  }

  rowLine(ctx: Children): Line | undefined {
    const start = tokens(ctx, 'RowStart')[0];
    if (!real(start)) return undefined;
    const w = start.image.toLowerCase();
    if (!(ROW_WORDS as readonly string[]).includes(w)) {
      const range = this.range(start);
      const s = suggest(w, ROW_WORDS, range);
      this.diagnostics.push({
        severity: 'error',
        id: 'syntax',
        message: `'${start.image}' is not a word the notation knows.${s.text}`,
        range,
        hint: "a row starts with 'row N:' or 'round N:'",
        ...(s.fix ? { fix: s.fix } : {}),
      });
    }
    const [n1, n2] = tokens(ctx, 'RowNumber').filter(real);
    const colon = tokens(ctx, 'Colon').find(real);
    let last = n2 ?? n1 ?? start;
    const label = (): string => `${start.image}${n1 ? ` ${n1.image}${n2 ? `-${n2.image}` : ''}` : ''}`;
    if (!n1)
      this.error(
        this.ix.range(endOf(start), endOf(start)),
        `expected a row number after '${start.image}'`,
        "write it like 'row 3: AB CB'",
      );
    if (!colon) {
      const at = this.ix.range(endOf(last), endOf(last));
      this.diagnostics.push({
        severity: 'error',
        id: 'syntax',
        message: `expected ':' after '${label()}'`,
        range: at,
        hint: `write '${label()}: ' before the units`,
        fix: { title: "insert ':'", range: at, replacement: ':' },
      });
    }
    if (colon) last = colon;
    const items = this.items(ctx, true);
    const numberRange = n1 ? this.ix.range(n1.startOffset, endOf(n2 ?? n1)) : this.ix.range(endOf(start), endOf(start));
    const lastItem = items[items.length - 1];
    const end = Math.max(lastItem ? lastItem.range.endOffset : 0, endOf(last));
    if (items.length === 0) {
      this.error(
        this.ix.range(endOf(last), endOf(last)),
        `expected a colour key (A-Z), a group '(' or a skip '-' after '${label()}:'`,
        "a row lists its units, like 'row 2: *AAAA BA +AAA'",
      );
    }
    const from = n1 ? Number(n1.image) : 0;
    const lineEnd = tokens(ctx, 'LineEnd')[0];
    const row: RowNode = {
      word: w.startsWith('round') ? 'round' : 'row',
      from,
      to: n2 ? Number(n2.image) : from,
      items,
      notes: [],
      range: this.ix.range(start.startOffset, end),
      numberRange,
      leadingComments: [],
    };
    return { kind: 'row', row, end: real(lineEnd) ? lineEnd.startOffset : row.range.endOffset };
  }

  /** The unit list of a row or group, in source order; a row's stray ')' is reported in place. */
  private items(ctx: Children, row: boolean): ItemNode[] {
    const toks = tokens(ctx, 'BodyToken');
    const groups = nodes(ctx, 'group');
    const strays = row ? tokens(ctx, 'RParen') : NONE;
    const items: ItemNode[] = [];
    let ordered: readonly (IToken | CstNode)[] =
      groups.length === 0 ? toks : mergeByOffset<IToken | CstNode>(toks, groups);
    if (strays.length > 0) ordered = mergeByOffset<IToken | CstNode>(ordered, strays);
    for (const el of ordered) {
      if (!('image' in el)) {
        const group = this.visit(el) as GroupNode | undefined;
        if (group) items.push(group);
      } else if (!real(el)) continue;
      else if (el.tokenType.name === 'Units') this.units(el, items);
      else if (el.tokenType.name === 'RParen') {
        this.error(
          this.range(el),
          "this ')' closes no group",
          "open the group with '(' before its units, like '(AB CB)x2'",
        );
      } else {
        const item = this.bodyToken(el);
        if (item) items.push(item);
      }
    }
    return items;
  }

  /**
   * Split a run of units. The run is ASCII on one line, so columns follow from
   * offsets; this is the hot loop of a large file, so it scans characters
   * itself rather than calling out per unit.
   */
  private units(t: IToken, out: ItemNode[]): void {
    const { line, column } = this.ix.position(t.startOffset);
    const image = t.image;
    const n = image.length;
    let k = 0;
    while (k < n) {
      const from = k;
      const c0 = image.charCodeAt(k);
      if (c0 === 45) {
        k++;
        out.push({
          type: 'skip',
          range: {
            line,
            column: column + from,
            endLine: line,
            endColumn: column + k,
            offset: t.startOffset + from,
            endOffset: t.startOffset + k,
          },
        });
        while (k < n && (image.charCodeAt(k) === 32 || image.charCodeAt(k) === 9)) k++;
        continue;
      }
      const mark = c0 === 42 ? '*' : c0 === 43 ? '+' : '';
      if (mark !== '') k++;
      let lower = false;
      for (let c = image.charCodeAt(k); k < n && c !== 32 && c !== 9; c = image.charCodeAt(++k))
        if (c >= 97) lower = true;
      const offset = t.startOffset + from;
      const range: SourceRange = {
        line,
        column: column + from,
        endLine: line,
        endColumn: column + k,
        offset,
        endOffset: t.startOffset + k,
      };
      const written = this.keysOf(image, from + mark.length, k);
      while (k < n && (image.charCodeAt(k) === 32 || image.charCodeAt(k) === 9)) k++;
      if (written === '') {
        this.error(
          range,
          `'${mark}' needs its colour keys right after it`,
          `write the unit's keys with no space: '${mark}CCB'`,
        );
        continue;
      }
      const keys = lower ? written.toUpperCase() : written;
      if (lower) {
        this.diagnostics.push({
          severity: 'error',
          id: 'syntax',
          message: `colour keys are capital letters: '${mark}${written}' should be '${mark}${keys}'`,
          range,
          fix: { title: `write '${mark}${keys}'`, range, replacement: mark + keys },
        });
      }
      if (keys.length > 4) {
        this.error(
          range,
          `'${mark}${written}' has ${keys.length} colour keys, but a unit takes 1 to 4 new beads`,
          'leave a space between units',
        );
      }
      out.push({ type: 'unit', mark, keys, range });
    }
  }

  /**
   * The keys of a unit as a string, shared between units with the same keys:
   * a large pattern repeats a few key strings many thousands of times, and
   * looking them up by a number made from the letters allocates nothing.
   */
  private keysOf(image: string, from: number, to: number): string {
    if (to - from > 4) return image.slice(from, to);
    let code = 0;
    for (let i = from; i < to; i++) code = code * 128 + image.charCodeAt(i);
    let keys = this.keyStrings.get(code);
    if (keys === undefined) {
      keys = image.slice(from, to);
      this.keyStrings.set(code, keys);
    }
    return keys;
  }

  private bodyToken(t: IToken): ItemNode | undefined {
    if (!real(t)) return undefined;
    const range = this.range(t);
    switch (t.tokenType.name) {
      case 'Dash':
        return { type: 'skip', range };
      case 'RowNumber':
        this.error(
          range,
          `a number cannot stand among the units`,
          "to repeat units, put them in a group with a count: '(AB CB)x3'",
        );
        return undefined;
      case 'Colon':
        this.error(range, "a row has one ':', after its number", "start a new row on its own line: 'row 4: ...'");
        return undefined;
      default:
        this.error(
          range,
          `'${t.image}' repeats a group, but no group comes before it`,
          "put the units to repeat in '( )' right before the count: '(AB CB)x2'",
        );
        return undefined;
    }
  }

  group(ctx: Children): GroupNode | undefined {
    const open = tokens(ctx, 'LParen')[0];
    if (!real(open)) return undefined;
    const items = this.items(ctx, false);
    const close = tokens(ctx, 'RParen').find(real);
    const times = tokens(ctx, 'Times').find(real);
    const openRange = this.range(open);
    let count = 1;
    if (!close)
      this.error(openRange, "this group '(' is not closed", "close it with ')' and a repeat count, like '(AB CB)x2'");
    else if (!times)
      this.error(
        this.range(close),
        "a group needs a repeat count after ')'",
        "write how many times it repeats, like ')x2'",
      );
    if (times) {
      count = Number(/\d+/.exec(times.image)![0]);
      if (count < 1)
        this.error(this.range(times), 'a repeat count is at least 1', "write 'x1' or more, or leave the group out");
    }
    if (items.length === 0) this.error(openRange, 'this group is empty', "put the units to repeat inside: '(AB CB)x2'");
    const endTok = times ?? close;
    const lastItem = items[items.length - 1];
    const end = endTok ? endOf(endTok) : lastItem ? lastItem.range.endOffset : endOf(open);
    const range = this.ix.range(open.startOffset, end);
    return { type: 'group', items, times: count, range };
  }
}

/** Merge two lists of CST elements, each already in source order, by start offset. */
function mergeByOffset<T extends IToken | CstNode>(a: readonly T[], b: readonly T[]): T[] {
  const out: T[] = [];
  let i = 0;
  let j = 0;
  let nextB = b.length > 0 ? startOf(b[0]!) : Infinity;
  while (i < a.length || j < b.length) {
    if (i < a.length && startOf(a[i]!) <= nextB) out.push(a[i++]!);
    else {
      out.push(b[j++]!);
      nextB = j < b.length ? startOf(b[j]!) : Infinity;
    }
  }
  return out;
}

/** Where a token or a line or group node starts: each of those begins with one known token. */
function startOf(el: IToken | CstNode): number {
  if ('image' in el) return el.startOffset;
  const c = el.children;
  const first = (c.LParen ?? c.RowStart ?? c.HeaderKey ?? c.ColorKey)?.[0] as IToken | undefined;
  return first ? first.startOffset : Infinity;
}

/** Turn the CST into the AST, placing each line and attaching comments. */
export function toAst(
  cst: CstNode,
  ix: LineIndex,
  commentTokens: IToken[],
): { value: PatternAst; diagnostics: DiagnosticList } {
  const builder = new AstBuilder(ix);
  const lines = builder.visit(cst) as Line[];
  const diagnostics = builder.diagnostics;
  const comments: Comment[] = commentTokens.map((t) => ({
    text: t.image.slice(1),
    range: ix.range(t.startOffset, endOf(t)),
  }));
  const placed = placeLines(lines, comments, ix, diagnostics);
  return { value: placed, diagnostics };
}

function placeLines(lines: Line[], comments: Comment[], ix: LineIndex, diagnostics: DiagnosticList): PatternAst {
  const entries: HeaderEntry[] = [];
  const colors: ColorDef[] = [];
  const notes: NoteNode[] = [];
  const rows: RowNode[] = [];
  let colorsComments: Comment[] | undefined;
  let inColors = false;
  let c = 0;
  const headComments: Comment[] = [];
  const takeBefore = (offset: number): Comment[] => {
    const out: Comment[] = [];
    while (c < comments.length && comments[c]!.range.offset < offset) out.push(comments[c++]!);
    return out;
  };
  const err = (range: SourceRange, message: string, hint: string): void => {
    diagnostics.push({ severity: 'error', id: 'syntax', message, range, hint });
  };

  lines.forEach((line, i) => {
    const start = line.kind === 'row' ? line.row.range.offset : line.range.offset;
    const leading = takeBefore(start);
    if (i === 0) headComments.push(...leading.splice(0));
    const seenRow = rows.length > 0;
    if (line.kind === 'row') {
      const inside = takeBefore(line.end);
      const trailing = inside.pop();
      line.row.leadingComments = [...leading, ...inside];
      if (trailing) line.row.trailingComment = trailing;
      rows.push(line.row);
      inColors = false;
      return;
    }
    if (line.kind === 'key') {
      if (line.key === NOTE_KEY) {
        const note: NoteNode = { text: line.value, range: line.range, leadingComments: leading };
        (seenRow ? rows[rows.length - 1]!.notes : notes).push(note);
        return;
      }
      if ((COLORS_KEYS as readonly string[]).includes(line.key)) {
        if (seenRow)
          err(line.keyRange, "the 'colors:' block goes before the first row", 'move it up, under the header');
        if (line.value !== '')
          err(
            line.valueRange,
            "nothing goes after 'colors:' on its line",
            "write each colour on its own line below: '  A  #2e6f8e  teal'",
          );
        colorsComments = [...(colorsComments ?? []), ...leading];
        inColors = true;
        return;
      }
      if ((ROW_WORDS as readonly string[]).includes(line.key)) {
        err(line.keyRange, `'${line.key}:' needs its number`, `write it like '${line.key} 3: AB CB'`);
        return;
      }
      if (seenRow)
        err(line.keyRange, `the header line '${line.key}:' comes after a row`, 'header lines go before the first row');
      const { key, keyRange, value, valueRange, range } = line;
      entries.push({ key, value, range, keyRange, valueRange, leadingComments: leading });
      return;
    }
    const def = colorLine(line, inColors && !seenRow, ix, diagnostics);
    if (def) colors.push({ ...def, leadingComments: leading });
  });
  const tailComments = takeBefore(Infinity);
  const { header, diagnostics: headerDiagnostics } = readHeader(entries);
  diagnostics.push(...headerDiagnostics);
  const ast: PatternAst = { header, colors, notes, rows, comments, headComments, tailComments };
  if (colorsComments) ast.colorsComments = colorsComments;
  return ast;
}

/** A colour line, or a word line that is not one (a header key without its ':', a stray word). */
function colorLine(
  line: ColorLine,
  inBlock: boolean,
  ix: LineIndex,
  diagnostics: DiagnosticList,
): Omit<ColorDef, 'leadingComments'> | undefined {
  const push = (range: SourceRange, message: string, hint: string, id = 'syntax'): void => {
    diagnostics.add(() => ({ severity: 'error', id, message, range, hint }));
  };
  const lower = line.word.toLowerCase();
  const known = [...HEADER_KEYS, NOTE_KEY, ...COLORS_KEYS];
  if (known.includes(lower as never)) {
    const at = ix.range(line.wordRange.endOffset, line.wordRange.endOffset);
    diagnostics.push({
      severity: 'error',
      id: 'syntax',
      message: `expected ':' after '${line.word}'`,
      range: line.wordRange,
      hint: `write '${line.word}: ...'`,
      fix: { title: "insert ':'", range: at, replacement: ':' },
    });
    return undefined;
  }
  if (line.word.length > 1) {
    const message = inBlock
      ? `'${line.word}' is not a colour key: a key is one capital letter A-Z`
      : `'${line.word}' is not a header key, a colour or a row.${didYouMean(lower, [...known, ...ROW_WORDS])}`;
    push(
      line.wordRange,
      message,
      inBlock ? "write the colour as 'A  #2e6f8e  teal'" : "header lines look like 'title: Kestrel Fan'",
    );
    return undefined;
  }
  if (!inBlock)
    push(
      line.wordRange,
      `the colour line '${line.word}' is outside the 'colors:' block`,
      "put colour lines under a 'colors:' line, before the first row",
    );
  const key = line.word.toUpperCase();
  if (key !== line.word) {
    diagnostics.push({
      severity: 'error',
      id: 'syntax',
      message: `colour keys are capital letters: '${line.word}' should be '${key}'`,
      range: line.wordRange,
      fix: { title: `write '${key}'`, range: line.wordRange, replacement: key },
    });
  }
  const text = line.text;
  const m = /^(\s*)(\S*)(\s*)([\s\S]*?)\s*$/.exec(text)!;
  const written = m[2]!;
  const cStart = line.textOffset + m[1]!.length;
  const colorRange = ix.range(cStart, cStart + written.length);
  const hex = written === '' ? null : colorHex(written);
  if (written === '')
    push(
      line.wordRange,
      `colour '${key}' has no colour`,
      "write a hex colour or a CSS colour name after the key: 'A  #2e6f8e  teal'",
      'bad-color',
    );
  else if (hex === null) diagnostics.push(badColor(key, written, colorRange));
  return { key, written, hex, name: m[4]!, range: line.range, keyRange: line.wordRange, colorRange };
}
