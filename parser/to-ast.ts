/**
 * CST to AST: a Chevrotain visitor that turns each line into a node with a
 * source range; `place-lines.ts` then places the lines (header, colours,
 * notes, rows) and attaches comments. Problems only the shape of a line shows (a missing row
 * number or ':', an unclosed group, a lower-case key) are reported here.
 */
import type { CstElement, CstNode, IToken } from './chevrotain.js';
import type { Diagnostic, SourceRange } from '../shared/diagnostic.js';
import type { Comment, GroupNode, ItemNode, PatternAst, RowNode } from './ast.js';
import { parser } from './grammar.js';
import type { LineIndex } from './positions.js';
import { placeLines, type Line } from './place-lines.js';
import { DiagnosticList } from './limits.js';
import { suggest } from './suggest.js';
import { LOWER_CASE_HINT, ROW_WORDS } from './values.js';

type Children = Record<string, CstElement[] | undefined>;

/** Shared by every absent child list, so a missing one allocates nothing. */
const NONE: readonly never[] = [];
/** One past the token's last code unit. */
const endOf = (t: IToken): number => t.startOffset + t.image.length;
const tokens = (ctx: Children, name: string): readonly IToken[] => (ctx[name] as IToken[] | undefined) ?? NONE;
const nodes = (ctx: Children, name: string): readonly CstNode[] => (ctx[name] as CstNode[] | undefined) ?? NONE;
/** Tokens inserted by error recovery have no text behind them. */
const real = (t: IToken | undefined): t is IToken =>
  t !== undefined && !t.isInsertedInRecovery && !Number.isNaN(t.startOffset);

/**
 * Shape errors the later checks must know of, so one mistake gets one
 * diagnostic: a unit in lower case (its diagnostic, by the unit's offset,
 * also names its undefined keys), rows without their ':' (whose number
 * is not checked, as the line may not be read as meant), and the offsets of
 * characters typed for a row's ':' (which the lexer does not report again).
 */
export interface ShapeErrors {
  lowerCase: Map<number, Diagnostic>;
  noColon: Set<RowNode>;
  colonLookAlikes: Set<number>;
}

/** Typed where a row's ':' belongs; each is a stray to the lexer. */
const COLON_LOOK_ALIKES = [',', ';', '.', '\uff1a'];

const BaseVisitor = parser.getBaseCstVisitorConstructor();

class AstBuilder extends BaseVisitor {
  readonly diagnostics = new DiagnosticList();
  readonly shape: ShapeErrors = { lowerCase: new Map(), noColon: new Set(), colonLookAlikes: new Set() };
  private readonly keyStrings = new Map<number, string>();

  constructor(
    private readonly ix: LineIndex,
    /** Lines where the lexer found characters it could not read: a row there may look empty only because of them. */
    private readonly strayLines: ReadonlySet<number>,
  ) {
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
    const image = head.image;
    const word = /^[A-Za-z][\w-]*/.exec(image)![0];
    const isKey = head.tokenType.name === 'HeaderKey';
    // The text after the word (a colour line) or after the ':' (a header line).
    const textAt = isKey ? image.indexOf(':', word.length) + 1 : word.length;
    const raw = image.slice(textAt);
    const textOffset = head.startOffset + textAt;
    const range = this.ix.range(head.startOffset, textOffset + raw.trimEnd().length);
    const wordRange = this.ix.range(head.startOffset, head.startOffset + word.length);
    if (!isKey) return { kind: 'color', word, wordRange, text: raw, textOffset, range };
    const lead = raw.length - raw.trimStart().length;
    const value = raw.trim();
    return {
      kind: 'key',
      key: word.toLowerCase(),
      keyRange: wordRange,
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
        message: `'${start.image}' is not a word the notation knows${s.text}`,
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
      const after = endOf(last);
      // `row 4, AB` or `row 4：AB`: the character typed for the ':' is the one problem, not also a stray.
      const typed = COLON_LOOK_ALIKES.find((c) => this.ix.textAt(after, c.length) === c);
      const at = this.ix.range(after, after + (typed?.length ?? 0));
      if (typed) this.shape.colonLookAlikes.add(after);
      this.diagnostics.push({
        severity: 'error',
        id: 'syntax',
        message: `expected ':' after '${label()}'${typed ? `, not '${typed}'` : ''}`,
        range: at,
        hint: `write '${label()}: ' before the units`,
        fix: { title: typed ? "write ':'" : "insert ':'", range: at, replacement: ':' },
      });
    }
    if (colon) last = colon;
    const items = this.items(ctx, true);
    const numberRange = n1 ? this.ix.range(n1.startOffset, endOf(n2 ?? n1)) : this.ix.range(endOf(start), endOf(start));
    const lastItem = items[items.length - 1];
    const end = Math.max(lastItem ? lastItem.range.endOffset : 0, endOf(last));
    if (items.length === 0 && !this.strayLines.has(this.ix.position(start.startOffset).line)) {
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
    if (!colon) this.shape.noColon.add(row);
    return { kind: 'row', row, end: real(lineEnd) ? lineEnd.startOffset : row.range.endOffset };
  }

  /**
   * The unit list of a row or group, in source order; a row's stray ')' is
   * reported in place. `count` is a repeat count already read as the group's own.
   */
  private items(ctx: Children, row: boolean, count?: IToken): ItemNode[] {
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
      } else if (!real(el) || el === count) continue;
      else if (el.tokenType.name === 'Units') this.units(el, items);
      else if (el.tokenType.name === 'RParen') {
        this.error(
          this.range(el),
          "this ')' closes no group",
          "open the group with '(' before its units, like '(AB CB)x2'",
        );
      } else {
        const item = this.bodyToken(el, !row);
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
        const d: Diagnostic = {
          severity: 'error',
          id: 'syntax',
          message: `colour keys are capital letters: '${mark}${written}' should be '${mark}${keys}'`,
          range,
          hint: LOWER_CASE_HINT,
          fix: { title: `write '${mark}${keys}'`, range, replacement: mark + keys },
        };
        this.diagnostics.push(d);
        this.shape.lowerCase.set(offset, d);
      }
      if (keys.length > 4) {
        // Named `bead-count`, as the engine's count check is: the text alone shows it, and the
        // engine's own report of the same unit is then merged into this one.
        this.error(
          range,
          `'${mark}${written}' has ${keys.length} colour keys, but a unit holds at most 4 beads`,
          'a unit takes 1 to 4 new beads; to write two units, leave a space between them',
          'bead-count',
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

  private bodyToken(t: IToken, inGroup: boolean): ItemNode | undefined {
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
        if (inGroup)
          this.error(
            range,
            `'${t.image}' stands inside the group: a group's repeat count goes right after its ')'`,
            "move the count out of the group, like '(AB CB)x2'",
          );
        else
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
    const close = tokens(ctx, 'RParen').find(real);
    // `(AB CB x2`: the count inside an unclosed group is where its ')' was meant.
    const unclosedCount = close
      ? undefined
      : tokens(ctx, 'BodyToken').find((t) => real(t) && t.tokenType.name === 'Times');
    const items = this.items(ctx, false, unclosedCount);
    const times = tokens(ctx, 'Times').find(real) ?? unclosedCount;
    const openRange = this.range(open);
    let count = 1;
    if (unclosedCount) {
      const at = this.ix.range(unclosedCount.startOffset, unclosedCount.startOffset);
      const opened =
        openRange.line === at.line
          ? `column ${openRange.column}`
          : `line ${openRange.line}, column ${openRange.column}`;
      this.diagnostics.push({
        severity: 'error',
        id: 'syntax',
        message: `')' is missing before '${unclosedCount.image}': the group opened at ${opened} is not closed`,
        range: this.range(unclosedCount),
        hint: "close the group right before its count, like '(AB CB)x2'",
        fix: { title: "insert ')'", range: at, replacement: ')' },
      });
    } else if (!close)
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
    const end = Math.max(endTok ? endOf(endTok) : endOf(open), lastItem ? lastItem.range.endOffset : 0);
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
  strayLines: ReadonlySet<number> = new Set(),
): { value: PatternAst; diagnostics: DiagnosticList; shape: ShapeErrors } {
  const builder = new AstBuilder(ix, strayLines);
  const lines = builder.visit(cst) as Line[];
  const diagnostics = builder.diagnostics;
  const comments: Comment[] = commentTokens.map((t) => ({
    text: t.image.slice(1),
    range: ix.range(t.startOffset, endOf(t)),
  }));
  const placed = placeLines(lines, comments, ix, diagnostics);
  return { value: placed, diagnostics, shape: builder.shape };
}
