/**
 * fast-check generators of valid patterns that follow NOTATION.md section 3:
 * flat panels, fans, tubes and rounds of random sizes and colours, with
 * groups (sometimes nested), row ranges, notes, comments and continuation
 * lines. Bead counts per unit follow the table in section 3 exactly.
 */
import fc from 'fast-check';

// Colours far apart from each other, spelled in several ways (names and hex, any case).
const COLOURS = ['#1a1a1a', 'ivory', '#B5482A', 'Teal', '#d9a521', 'rebeccapurple', '#8fa683', 'CRIMSON'];
const KEYS = 'ABCDEFGH';
const safeText = fc.stringMatching(/^[A-Za-z0-9 ,.'!?&()-]{0,30}$/);

type Kind = 'panel' | 'fan' | 'tube' | 'round';
/** A unit before keys are chosen: its mark and how many new beads it takes. */
interface Spec {
  mark: '' | '*' | '+';
  beads: number;
}

const plain = (beads: number): Spec => ({ mark: '', beads });

/** Flat rows: row 1 is 4, 3, 3...; later rows 3, 2, 2... */
const panelRows = (width: number, rows: number): Spec[][] =>
  Array.from({ length: rows }, (_, r) =>
    Array.from({ length: width }, (_, u) => plain(r === 0 ? (u === 0 ? 4 : 3) : u === 0 ? 3 : 2)),
  );

/** A fan: row r has a fresh ring, 2r - 3 ordinary units and an increase. */
const fanRows = (rows: number): Spec[][] =>
  Array.from({ length: rows }, (_, r) =>
    r === 0
      ? [plain(4)]
      : [{ mark: '*', beads: 4 }, ...Array.from({ length: 2 * r - 1 }, () => plain(2)), { mark: '+', beads: 3 }],
  );

/**
 * Closed rows: round 1 is 4, 3..., 2; a later round builds one unit on each
 * unit below (3 first, 2 after, 1 to close) and adds increases (3 each, 2 when
 * it closes) at the chosen places, never first.
 */
function closedRows(first: number, increases: number[][]): Spec[][] {
  const rows: Spec[][] = [Array.from({ length: first }, (_, u) => plain(u === 0 ? 4 : u === first - 1 ? 2 : 3))];
  for (const incs of increases) {
    const below = rows[rows.length - 1]!.length;
    const marks: ('' | '+')[] = Array.from({ length: below }, () => '');
    // Each increase goes after the base unit it names (1-based into this round's base units).
    for (const at of [...incs].sort((a, b) => b - a)) marks.splice(Math.min(at, marks.length), 0, '+');
    rows.push(
      marks.map((mark, i) => {
        const last = i === marks.length - 1;
        if (mark === '+') return { mark, beads: last ? 2 : 3 };
        return plain(i === 0 ? 3 : last ? 1 : 2);
      }),
    );
  }
  return rows;
}

const specsArb: fc.Arbitrary<{ kind: Kind; rows: Spec[][] }> = fc.oneof(
  fc
    .record({ w: fc.integer({ min: 1, max: 7 }), r: fc.integer({ min: 1, max: 7 }) })
    .map(({ w, r }) => ({ kind: 'panel' as const, rows: panelRows(w, r) })),
  fc.integer({ min: 1, max: 6 }).map((r) => ({ kind: 'fan' as const, rows: fanRows(r) })),
  fc.record({ c: fc.integer({ min: 3, max: 8 }), r: fc.integer({ min: 0, max: 5 }) }).map(({ c, r }) => ({
    kind: 'tube' as const,
    rows: closedRows(
      c,
      Array.from({ length: r }, () => []),
    ),
  })),
  fc
    .record({
      c: fc.integer({ min: 3, max: 8 }),
      incs: fc.array(fc.array(fc.integer({ min: 1, max: 12 }), { maxLength: 7 }), { maxLength: 4 }),
    })
    .map(({ c, incs }) => ({ kind: 'round' as const, rows: closedRows(c, incs) })),
);

/** Units written as text, with repeats folded into groups (sometimes nested) where a coin says so. */
function writeUnits(units: string[], coins: () => boolean): string[] {
  const out: string[] = [];
  for (let i = 0; i < units.length;) {
    let folded = false;
    for (const size of [2, 1]) {
      let times = 1;
      const seg = units.slice(i, i + size).join(' ');
      while (
        i + (times + 1) * size <= units.length &&
        units.slice(i + times * size, i + (times + 1) * size).join(' ') === seg
      )
        times++;
      if (seg !== '' && times >= 2 && coins()) {
        out.push(coins() ? `((${seg})x${times})x1` : `(${seg})x${times}`);
        i += size * times;
        folded = true;
        break;
      }
    }
    if (!folded) out.push(units[i++]!);
  }
  return out;
}

export const patternArb: fc.Arbitrary<string> = fc
  .record({
    specs: specsArb,
    colours: fc.integer({ min: 1, max: COLOURS.length }),
    seed: fc.array(fc.nat(), { minLength: 64, maxLength: 64 }),
    title: safeText.filter((t) => t.trim() !== ''),
    notes: fc.array(safeText, { maxLength: 2 }),
    motif: fc.boolean(),
  })
  .map(({ specs, colours, seed, title, notes, motif }) => {
    let k = 0;
    const rnd = (n: number): number => seed[k++ % seed.length]! % n;
    const coins = (): boolean => rnd(2) === 0;
    const keys = KEYS.slice(0, colours);
    // A motif of one or two keys makes units repeat, so groups and ranges appear.
    const key = (i: number): string => keys[motif ? i % Math.min(2, keys.length) : rnd(keys.length)]!;
    const layout = specs.kind === 'tube' ? 'tube' : specs.kind === 'round' ? 'round' : 'flat';
    const lines = [`title: ${title.trim()}`, `layout: ${layout}`];
    for (const n of notes) lines.push(`note: ${n}`);
    lines.push('colors:', ...[...keys].map((c, i) => `  ${c}  ${COLOURS[i]}`));
    const word = coins() ? 'row' : 'round';
    const written = specs.rows.map((row) =>
      writeUnits(
        row.map((s) => s.mark + Array.from({ length: s.beads }, (_, b) => key(b)).join('')),
        coins,
      ),
    );
    for (let r = 0; r < written.length;) {
      let to = r;
      while (to + 1 < written.length && written[to + 1]!.join(' ') === written[r]!.join(' ') && r > 0) to++;
      if (rnd(4) === 0) lines.push(`# before row ${r + 1}`);
      const label = to > r ? `${word}s ${r + 1}-${to + 1}` : `${word} ${r + 1}`;
      const items = written[r]!;
      const cut = items.length > 2 && coins() ? 1 + rnd(items.length - 1) : items.length;
      lines.push(
        `${label}: ${items.slice(0, cut).join(' ')}${cut === items.length && rnd(4) === 0 ? '  # trailing' : ''}`,
      );
      if (cut < items.length) lines.push(`   ${items.slice(cut).join(' ')}`);
      if (rnd(5) === 0) lines.push(`note: row note ${r + 1}`);
      r = to + 1;
    }
    return lines.join('\n') + '\n';
  });
