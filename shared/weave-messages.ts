/**
 * The wording of the weave checks, kept apart from the net builder so the
 * builder reads as rules and the messages read as sentences.
 */
import type { Diagnostic, Fix, Severity, SourceRange } from './diagnostic.js';
import type { Layout, UnitNode } from '../parser/ast.js';

const BASE_BIT = 1;
const FAR_BIT = 2;
const NEAR_BIT = 8;

export function weaveDiagnostic(
  severity: Severity,
  id: string,
  message: string,
  range: SourceRange,
  hint?: string,
): Diagnostic {
  return hint === undefined ? { severity, id, message, range } : { severity, id, message, range, hint };
}

function sharesPhrase(shared: number, mark: string, where: Where): string {
  if (shared === 0) {
    if (mark === '*') return 'a fresh ring shares no bead';
    return where.firstRow && where.first
      ? `the first unit of ${where.word} 1 shares no bead`
      : 'this unit shares no bead';
  }
  const parts: string[] = [];
  if (shared & NEAR_BIT) parts.push('its near bead');
  if (shared & BASE_BIT) parts.push('a base bead');
  if (shared & FAR_BIT) parts.push('its far bead (the row closes on its first unit)');
  const list = parts.length === 1 ? parts[0]! : `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]!}`;
  return `this unit shares ${list}`;
}

interface Where {
  layout: Layout;
  word: 'row' | 'round';
  first: boolean;
  firstRow: boolean;
  last: boolean;
}

/** What would make the unit valid, in words, and as an edit where it is a mark to add or remove. */
function suggestion(shared: number, expected: number, unit: UnitNode, where: Where): { text: string; fix?: Fix } {
  const written = unit.keys.length;
  const r = unit.range;
  const add = (mark: string, title: string): Fix => ({
    title,
    range: { ...r, endLine: r.line, endColumn: r.column, endOffset: r.offset },
    replacement: mark,
  });
  const remove = (title: string): Fix => ({
    title,
    range: { ...r, endLine: r.line, endColumn: r.column + 1, endOffset: r.offset + 1 },
    replacement: '',
  });
  if (unit.mark === '' && written === expected + 1 && shared & BASE_BIT && !where.first) {
    if (where.layout === 'round' || (where.layout === 'flat' && where.last))
      return { text: "Mark an increase with '+' if that is meant.", fix: add('+', "mark an increase '+'") };
  }
  if (unit.mark === '' && written === 4 && where.first && !where.firstRow && where.layout === 'flat')
    return { text: "Mark a fresh ring with '*' if that is meant.", fix: add('*', "mark a fresh ring '*'") };
  if (unit.mark === '+' && written === expected - 1)
    return { text: "Remove the '+' if no increase is meant.", fix: remove("remove the '+'") };
  if (unit.mark === '*' && written === 3)
    return { text: "Remove the '*' if the unit is meant to build on the row before.", fix: remove("remove the '*'") };
  return { text: `Write ${expected} key${expected === 1 ? '' : 's'}, one for each new bead.` };
}

/** `row 4, unit 3: this unit shares its near bead and a base bead, so it takes 2 new beads; 3 are written (C C B). ...` */
export function beadCountDiagnostic(
  row: number,
  index: number,
  shared: number,
  expected: number,
  unit: UnitNode,
  where: Where,
): Diagnostic {
  const written = unit.keys.length;
  const spaced = [...unit.keys].join(' ');
  const { text, fix } = suggestion(shared, expected, unit, where);
  const message =
    `${where.word} ${row}, unit ${index}: ${sharesPhrase(shared, unit.mark, where)}, so it takes ${expected} new bead${expected === 1 ? '' : 's'}; ` +
    `${written} ${written === 1 ? 'is' : 'are'} written (${spaced}). ${text}`;
  const closes =
    where.layout === 'flat' ? '' : `, and a ${where.word}'s last unit also shares its far bead with the first`;
  const hint = `a unit takes only the beads it does not share: 4, less one for each bead it shares with the unit before it or the ${where.word} below${closes}`;
  const d: Diagnostic = { severity: 'error', id: 'bead-count', message, range: unit.range, hint };
  if (fix) d.fix = fix;
  return d;
}

/** A rule a unit or skip breaks: what is wrong, and how to put it right. */
export interface Misplaced {
  message: string;
  hint: string;
}

/** Why a unit's mark is not allowed where it stands (NOTATION.md section 2, "Marks"), or null. */
export function misplacedMark(
  layout: Layout,
  word: 'row' | 'round',
  item: UnitNode,
  first: boolean,
  firstRow: boolean,
  /** An unmarked unit follows in the row. */
  plainAfter: boolean,
  i: number,
): Misplaced | null {
  if (item.mark === '*') {
    if (layout !== 'flat')
      return {
        message: `a fresh ring '*' is only used in flat pieces; this is a ${layout}`,
        hint: "remove the '*' and write the unit's new beads",
      };
    if (firstRow)
      return {
        message: `${word} 1 starts with an unmarked unit; '*' starts a later row one place beyond the end of the row before`,
        hint: "remove the '*'",
      };
    if (!first || i > 0)
      return {
        message: "a fresh ring '*' can only be the first unit of a row",
        hint: 'move it to the start of the row',
      };
  }
  if (item.mark === '+') {
    if (first)
      return {
        message: "an increase '+' shares the bead of the unit before it, so it cannot be a row's first unit",
        hint: 'start the row with an ordinary unit',
      };
    if (firstRow)
      return {
        message: `${word} 1 has no ${word} below it, so an increase '+' means nothing there; write the unit unmarked`,
        hint: "remove the '+'",
      };
    if (layout === 'tube')
      return {
        message: "a tube keeps the same number of units in every row, so it has no increases '+'",
        hint: "remove the '+', or change the layout to round",
      };
    if (layout === 'flat' && plainAfter)
      return {
        message:
          "in a flat piece an increase '+' can only stand at the end of a row, after the units built on the row before",
        hint: "move the increases after the row's last ordinary unit",
      };
  }
  return null;
}

export function misplacedSkip(firstRow: boolean, word: 'row' | 'round'): Misplaced {
  return firstRow
    ? { message: `${word} 1 has no ${word} below it to pass over, so it cannot skip '-'`, hint: 'remove the skip' }
    : {
        message: "in a flat piece a skip '-' can only stand at the start or the end of a row",
        hint: 'move the skip to an end of the row, or remove it',
      };
}
