/**
 * The `fourfold.model/1` value from the three engine stages: the net
 * (weave.ts), the thread (thread.ts) and the geometry (layout.ts). Bead ids
 * become pick-up ranks here, so a bead's id says when the thread added it.
 */
import { fileStart, sortDiagnostics, type Diagnostic, type Result, type SourceRange } from './diagnostic.js';
import type { PatternAst } from '../parser/ast.js';
import type { Bead, LayoutInfo, Model, Place, RowInfo, ThreadPass, Unit, UnitStep } from './model.js';
import { weave } from './weave.js';
import { beadAt, popcount, type Weave } from './weave-net.js';
import { PLACES, thread, type Thread } from './thread.js';
import { layout, type Geometry } from './layout.js';

const r4 = (n: number): number => Math.round(n * 1e4) / 1e4;

/** Every `Bead.places` value there can be, made once and shared (a large model has a few hundred thousand beads). */
const PLACE_LISTS: readonly Place[][] = Array.from({ length: 20 }, (_, i) => {
  const owner = PLACES[Math.floor(i / 5)]!;
  const sharer = PLACES[i % 5];
  return sharer === undefined ? [owner] : [owner, sharer];
});

function beadsOf(w: Weave, t: Thread, g: Geometry): Bead[] {
  const beads = new Array<Bead>(w.beadOwner.length);
  for (let old = 0; old < w.beadOwner.length; old++) {
    const sharer = w.beadSharer[old]!;
    const bead: Bead = {
      id: t.rank[old]!,
      color: t.color[old]!,
      units: sharer === -1 ? [w.beadOwner[old]!] : [w.beadOwner[old]!, sharer],
      places: PLACE_LISTS[w.beadOwnerPlace[old]! * 5 + (sharer === -1 ? 4 : w.beadSharerPlace[old]!)]!,
      junctions: [w.beadEnds[2 * old]!, w.beadEnds[2 * old + 1]!],
      x: r4(g.bx[old]!),
      y: r4(g.by[old]!),
      angle: r4(g.bAngle[old]!),
      length: r4(g.bLength[old]!),
    };
    if (g.bGap[old]) bead.gap = true;
    beads[bead.id] = bead;
  }
  return beads;
}

function unitsOf(w: Weave, t: Thread, g: Geometry, id: (old: number) => number | null): Unit[] {
  // Units repeated by a group or a row range come from one node: they share one source object.
  const sources = new Map<SourceRange, Unit['source']>();
  const sourceOf = (r: SourceRange): Unit['source'] => {
    let s = sources.get(r);
    if (!s) sources.set(r, (s = { line: r.line, column: r.column, endLine: r.endLine, endColumn: r.endColumn }));
    return s;
  };
  return w.units.map((u, i) => {
    const step = t.steps[i]!;
    const unit: Unit = {
      id: i,
      row: u.row,
      index: u.index,
      mark: u.mark,
      places: {
        base: id(beadAt(w, u.id, 0)),
        far: id(beadAt(w, u.id, 1)),
        top: id(beadAt(w, u.id, 2)),
        near: id(beadAt(w, u.id, 3)),
      },
      x: r4(g.ux[i]!),
      y: r4(g.uy[i]!),
      angle: r4(g.uAngle[i]!),
      direction: step.direction,
      startCorner: step.startCorner,
      source: sourceOf(u.range),
    };
    // A failed unit shows only the beads it would have shared; its own places stay empty.
    if (u.failed) unit.failed = true;
    return unit;
  });
}

function assembleModel(
  ast: PatternAst,
  w: Weave,
  t: Thread,
  g: Geometry,
  layout: LayoutInfo,
  diagnostics: Diagnostic[],
): Model {
  const id = (old: number): number | null => (old < 0 ? null : t.rank[old]!);
  const ranked = (b: number): number => t.rank[b]!;
  // The thread's records are renumbered in place: they are built for this model and for nothing else.
  const passes: ThreadPass[] = t.passes;
  for (const p of passes) p.bead = ranked(p.bead);
  const steps: UnitStep[] = t.steps;
  for (const s of steps) {
    for (const a of s.actions) a.bead = ranked(a.bead);
    for (let i = 0; i < s.moveOn.length; i++) s.moveOn[i] = ranked(s.moveOn[i]!);
  }
  const rows: RowInfo[] = w.rows.map((r) => ({
    row: r.row,
    word: r.word,
    units: r.units,
    beads: r.units.reduce((n, u) => n + (w.units[u]!.failed ? 0 : 4 - popcount(w.units[u]!.shared)), 0),
    heading: r.heading,
    notes: r.notes,
    line: r.line,
  }));
  const h = ast.header;
  return {
    schema: 'fourfold.model/1',
    header: {
      title: h.title,
      ...(h.designer !== undefined && { designer: h.designer }),
      beads: h.beads,
      layout: h.layout,
      order: h.order,
      ...(h.thread !== undefined && { thread: h.thread }),
      ...(h.description !== undefined && { description: h.description }),
      ...(h.license !== undefined && { license: h.license }),
      notes: ast.notes.map((n) => n.text),
    },
    palette: ast.colors.filter((c) => c.hex !== null).map((c) => ({ key: c.key, hex: c.hex!, name: c.name })),
    layout,
    rows,
    units: unitsOf(w, t, g, id),
    beads: beadsOf(w, t, g),
    junctions: g.jx.map((x, j) => ({ id: j, x: r4(x), y: r4(g.jy[j]!) })),
    thread: passes,
    steps,
    diagnostics,
  };
}

export interface Compiled {
  ast: PatternAst;
  model: Model;
}

/**
 * One diagnostic per check and place: where the parser and the engine both
 * check a thing (a misplaced mark, a size limit), the parser's wording, which
 * comes first, is kept.
 */
function merge(...lists: Diagnostic[][]): Diagnostic[] {
  const seen = new Set<string>();
  const out: Diagnostic[] = [];
  for (const d of lists.flat()) {
    const key = `${d.id}@${d.range.offset}:${d.range.endOffset}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(d);
  }
  return sortDiagnostics(out);
}

/** From an AST (parsed, or built by a tool) to the model: weave, thread, layout. `earlier` are the parser's diagnostics. */
export function compileAst(ast: PatternAst, earlier: Diagnostic[] = []): Result<Compiled> {
  try {
    return build(ast, earlier);
  } catch (e) {
    // A fault of ours, not the pattern's: say so, and still give callers a model (of no rows) to show.
    const what = e instanceof Error ? e.message : String(e);
    const fault: Diagnostic = {
      severity: 'error',
      id: 'internal',
      message: `Fourfold could not weave this pattern because of a fault of its own (${what})`,
      range: fileStart,
      hint: 'please report this, with the file',
    };
    const empty = build({ ...ast, rows: [] }, [...earlier, fault]);
    return { value: { ast, model: empty.value.model }, diagnostics: empty.diagnostics };
  }
}

function build(ast: PatternAst, earlier: Diagnostic[]): Result<Compiled> {
  const net = weave(ast);
  const path = thread(net.value);
  const geo = layout(net.value, ast.header.beads);
  // The parser words the size limit for the whole file; the engine's own stop at the limit need not say it again.
  const own = earlier.some((d) => d.id === 'too-large')
    ? net.diagnostics.filter((d) => d.id !== 'too-large')
    : net.diagnostics;
  const diagnostics = merge(earlier, own, path.diagnostics, geo.diagnostics);
  const model = assembleModel(ast, net.value, path.value, geo.value, geo.value.size, diagnostics);
  return { value: { ast, model }, diagnostics };
}
