/**
 * The bead net: from a `PatternAst` to units, beads and junctions, by the
 * sharing rules of NOTATION.md section 3. Where beads land inside a unit is the
 * thread's business (thread.ts); this stage only decides which places a unit
 * shares, which corners it shares, and checks the bead count.
 */
import type { Diagnostic, Result, SourceRange } from './diagnostic.js';
import type { PatternAst, RowNode } from '../parser/ast.js';
import { expandRow, type FlatItem } from '../parser/expand.js';
import { UNIT_LIMIT } from '../parser/limits.js';
import {
  BASE,
  FAR,
  NEAR,
  TOP,
  beadAt,
  cornerAt,
  popcount,
  type Weave,
  type WeaveRow,
  type WeaveUnit,
} from './weave-net.js';
import { weaveDiagnostic, beadCountDiagnostic, misplacedMark, misplacedSkip } from './weave-messages.js';

/** One top bead of a row, as the next row meets it: its ends on the near and far side of the new row's direction. */
interface BaseSlot {
  bead: number;
  nearJ: number;
  farJ: number;
  col: number;
}

class Builder {
  readonly w: Weave;
  readonly diagnostics: Diagnostic[] = [];
  private readonly closed: boolean;

  constructor(ast: PatternAst) {
    const layout = ast.header.layout;
    this.closed = layout !== 'flat';
    this.w = {
      layout,
      order: ast.header.order,
      units: [],
      rows: [],
      unitBeads: [],
      unitCorners: [],
      beadEnds: [],
      beadOwner: [],
      beadOwnerPlace: [],
      beadSharer: [],
      beadSharerPlace: [],
      junctionCount: 0,
    };
  }

  private junction(): number {
    return this.w.junctionCount++;
  }

  private bead(owner: number, place: number, j0: number, j1: number): number {
    const w = this.w;
    const id = w.beadOwner.length;
    w.beadEnds.push(j0, j1);
    w.beadOwner.push(owner);
    w.beadOwnerPlace.push(place);
    w.beadSharer.push(-1);
    w.beadSharerPlace.push(-1);
    return id;
  }

  private share(bead: number, unit: number, place: number): void {
    this.w.beadSharer[bead] = unit;
    this.w.beadSharerPlace[bead] = place;
  }

  private error(id: string, message: string, range: SourceRange, hint?: string): void {
    this.diagnostics.push(weaveDiagnostic('error', id, message, range, hint));
  }

  /** The top beads of a row as the next row meets them: flat rows turn back, closed rows go on round. */
  private slotsOf(row: WeaveRow): BaseSlot[] {
    const slots: BaseSlot[] = [];
    for (const id of row.units) {
      const u = this.w.units[id]!;
      if (u.failed) continue;
      const turn = !this.closed;
      slots.push({
        bead: beadAt(this.w, u.id, TOP),
        nearJ: cornerAt(this.w, u.id, turn ? 1 : 2),
        farJ: cornerAt(this.w, u.id, turn ? 2 : 1),
        col: u.col,
      });
    }
    if (!this.closed) slots.reverse();
    return slots;
  }

  build(rows: readonly RowNode[]): void {
    let used = 0;
    let prev: { row: WeaveRow; complete: boolean } | null = null;
    for (const node of rows) {
      const expanded = expandRow(node, UNIT_LIMIT - used);
      const count = countUnits(expanded.value);
      for (let n = node.from; n <= node.to; n++) {
        if (expanded.diagnostics.length > 0 || used + count > UNIT_LIMIT) {
          this.error(
            'too-large',
            `the pattern expands past ${UNIT_LIMIT.toLocaleString('en')} units; it is built up to ${node.word} ${n - 1}`,
            node.range,
            'check the repeat counts and row ranges; a pattern this large is refused',
          );
          return;
        }
        used += count;
        prev = this.buildRow(node, n, expanded.value, prev);
      }
    }
  }

  private buildRow(
    node: RowNode,
    n: number,
    items: readonly FlatItem[],
    prev: { row: WeaveRow; complete: boolean } | null,
  ): { row: WeaveRow; complete: boolean } {
    const w = this.w;
    const rowIndex = w.rows.length;
    const h: 1 | -1 = this.closed || rowIndex % 2 === 0 ? 1 : -1;
    const row: WeaveRow = {
      row: n,
      word: node.word,
      units: [],
      heading: this.closed ? 'around' : h === 1 ? 'right' : 'left',
      notes: node.notes.map((note) => note.text),
      line: node.range.line,
    };
    w.rows.push(row);
    const slots = prev ? this.slotsOf(prev.row) : [];
    const firstRow = prev === null;
    const below = prev ? prev.row.row : n - 1;
    const word = node.word;
    let ptr = 0;
    let index = 0;
    const lastUnitAt = lastIndexOf(items, (it) => it.type === 'unit');
    // Found once per row, so a row of many increases stays linear.
    const lastPlainAt = lastIndexOf(items, (it) => it.type === 'unit' && it.mark !== '+');
    const firstUnitAt = items.findIndex((it) => it.type === 'unit');

    for (let i = 0; i < items.length; i++) {
      const item = items[i]!;
      if (item.type === 'skip') {
        const inside = firstUnitAt !== -1 && i > firstUnitAt && i < lastUnitAt;
        if (firstRow || (!this.closed && inside)) {
          const skip = misplacedSkip(firstRow, word);
          this.error('misplaced-mark', skip.message, item.range, skip.hint);
          return { row, complete: false };
        }
        if (ptr >= slots.length) {
          if (prev?.complete !== false)
            this.error(
              'no-base-left',
              `${word} ${n}: this skip has no bead of ${word} ${below} left to pass over`,
              item.range,
              `remove the '-', or add units to ${word} ${below}`,
            );
          return { row, complete: false };
        }
        ptr++;
        continue;
      }
      index++;
      const first = index === 1;
      const closing = this.closed && i === lastUnitAt && !first;
      const misplaced = misplacedMark(w.layout, word, item, first, firstRow, i < lastPlainAt, i);
      const id = w.units.length;
      const unit: WeaveUnit = {
        row: n,
        index,
        mark: item.mark,
        keys: item.keys,
        range: item.range,
        id,
        shared: 0,
        failed: true,
        col: 0,
        heading: h,
        rowIndex,
      };
      w.units.push(unit);
      w.unitBeads.push(-1, -1, -1, -1);
      w.unitCorners.push(-1, -1, -1, -1);
      row.units.push(id);
      const before = first ? null : w.units[row.units[row.units.length - 2]!]!;
      const wantsBase = !firstRow && item.mark === '';
      const slot = slots[ptr];
      if (before) w.unitBeads[4 * id + NEAR] = beadAt(w, before.id, FAR);
      if (wantsBase && slot) w.unitBeads[4 * id + BASE] = slot.bead;
      unit.col =
        wantsBase && slot ? slot.col : before ? before.col + h : item.mark === '*' ? (slot?.col ?? 0) - h : index - 1;
      if (misplaced) {
        this.error('misplaced-mark', misplaced.message, item.range, misplaced.hint);
        return { row, complete: false };
      }
      if (wantsBase && ptr >= slots.length) {
        // After a row that stopped early, running out of base beads is that row's error, already reported.
        if (prev?.complete === false) {
          w.units.pop();
          w.unitBeads.length -= 4;
          w.unitCorners.length -= 4;
          row.units.pop();
          return { row, complete: false };
        }
        this.error(
          'no-base-left',
          `${word} ${n}, unit ${index}: this unit needs a base bead, but ${word} ${below} has none left to build on`,
          item.range,
          first || w.layout === 'tube'
            ? `end ${word} ${n} before this unit, or add units to ${word} ${below}`
            : "mark an increase with '+' if a new unit is meant here",
        );
        return { row, complete: false };
      }
      let shared = (before ? 1 << NEAR : 0) | (wantsBase ? 1 << BASE : 0);
      if (closing) shared |= 1 << FAR;
      const expected = 4 - popcount(shared);
      if (item.keys.length !== expected) {
        const where = { layout: w.layout, word, first, firstRow, last: i === lastUnitAt };
        this.diagnostics.push(beadCountDiagnostic(n, index, shared, expected, item, where));
        return { row, complete: false };
      }
      this.place(
        id,
        unit,
        before,
        shared,
        wantsBase ? slot! : null,
        slot ?? null,
        closing ? w.units[row.units[0]!]! : null,
      );
      if (wantsBase) ptr++;
    }
    if (ptr < slots.length && !firstRow) {
      const left = slots.length - ptr;
      this.diagnostics.push(
        weaveDiagnostic(
          'warning',
          'uncovered-base',
          `${word} ${n} leaves ${left} bead${left === 1 ? '' : 's'} of ${word} ${below} uncovered`,
          node.range,
          "build on them, or write '-' for each bead the row passes over",
        ),
      );
    }
    return { row, complete: true };
  }

  /** Shares, allocates and records the junctions and beads of a unit that passed its checks. */
  private place(
    id: number,
    u: WeaveUnit,
    before: WeaveUnit | null,
    shared: number,
    base: BaseSlot | null,
    nextSlot: BaseSlot | null,
    firstOfRow: WeaveUnit | null,
  ): void {
    const c = [-1, -1, -1, -1];
    if (before) {
      c[3] = cornerAt(this.w, before.id, 0);
      c[2] = cornerAt(this.w, before.id, 1);
      this.share(beadAt(this.w, before.id, FAR), id, NEAR);
    }
    if (base) {
      if (c[3] === -1) c[3] = base.nearJ;
      c[0] = base.farJ;
      this.share(base.bead, id, BASE);
    }
    if (firstOfRow) {
      c[0] = cornerAt(this.w, firstOfRow.id, 3);
      c[1] = cornerAt(this.w, firstOfRow.id, 2);
      this.w.unitBeads[4 * u.id + FAR] = beadAt(this.w, firstOfRow.id, NEAR);
      this.share(beadAt(this.w, id, FAR), id, FAR);
    }
    if (u.mark === '*' && nextSlot) c[0] = nextSlot.nearJ;
    // A round increase builds on nothing: its base bead is a loop at the corner its neighbours' lower corners meet.
    if (u.mark === '+' && this.w.layout === 'round' && c[0] === -1) c[0] = c[3]!;
    for (let k = 0; k < 4; k++) this.w.unitCorners[4 * id + k] = c[k] === -1 ? (c[k] = this.junction()) : c[k]!;
    for (let p = 0; p < 4; p++)
      if ((shared & (1 << p)) === 0) this.w.unitBeads[4 * u.id + p] = this.bead(id, p, c[(p + 3) % 4]!, c[p]!);
    u.shared = shared;
    u.failed = false;
  }
}

function countUnits(items: readonly FlatItem[]): number {
  let n = 0;
  for (const it of items) if (it.type === 'unit') n++;
  return n;
}

function lastIndexOf<T>(xs: readonly T[], pred: (x: T) => boolean): number {
  for (let i = xs.length - 1; i >= 0; i--) if (pred(xs[i]!)) return i;
  return -1;
}

/** Builds the bead net. Never throws on user input: a unit that fails is reported and its row stops there. */
export function weave(ast: PatternAst): Result<Weave> {
  const b = new Builder(ast);
  b.build(ast.rows);
  return { value: b.w, diagnostics: b.diagnostics };
}
