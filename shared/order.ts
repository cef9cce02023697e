/**
 * Converting a pattern between pick-up order and placed order (NOTATION.md
 * section 4). The thread says, for every unit, which bead goes where; the
 * converted keys are read off the woven model, so both files describe the
 * identical piece. Units alternate direction, so a repeat that was regular in
 * one order may not be in the other: such a group, or row range, is written
 * out in full.
 */
import { fileStart, hasErrors, type Result } from './diagnostic.js';
import type { HeaderEntry, ItemNode, KeyOrder, PatternAst, RowNode } from '../parser/ast.js';
import type { Model, Place } from './model.js';
import { compileAst } from './weave-model.js';

const RING: readonly Place[] = ['base', 'far', 'top', 'near'];

/** The keys of each built unit in the target order, by unit id. */
function keysIn(model: Model, target: KeyOrder): string[] {
  return model.units.map((u) => {
    const step = model.steps[u.id]!;
    if (target === 'pickup')
      return step.actions
        .filter((a) => a.kind === 'pickup')
        .map((a) => model.beads[a.bead]!.color)
        .join('');
    return RING.map((p) => u.places[p])
      .filter((b): b is number => b !== null && model.beads[b]!.units[0] === u.id)
      .map((b) => model.beads[b]!.color)
      .join('');
  });
}

const signature = (items: readonly ItemNode[]): string =>
  items
    .map((it) =>
      it.type === 'unit' ? `${it.mark}${it.keys}` : it.type === 'skip' ? '-' : `(${signature(it.items)})x${it.times}`,
    )
    .join(' ');

/** The items with converted keys, taking units from `next` in order of work. */
function convertItems(items: readonly ItemNode[], next: () => string): ItemNode[] {
  const out: ItemNode[] = [];
  for (const item of items) {
    if (item.type === 'unit') out.push({ ...item, keys: next() });
    else if (item.type === 'skip') out.push(item);
    else {
      const reps = Array.from({ length: item.times }, () => convertItems(item.items, next));
      const same = reps.every((r) => signature(r) === signature(reps[0]!));
      if (same) out.push({ ...item, items: reps[0]! });
      else for (const r of reps) out.push(...r);
    }
  }
  return out;
}

function withOrder(entries: readonly HeaderEntry[], target: KeyOrder): HeaderEntry[] {
  const at = entries.findIndex((e) => e.key === 'order');
  if (at !== -1) return entries.map((e, i) => (i === at ? { ...e, value: target } : e));
  const range = entries[entries.length - 1]?.range ?? fileStart;
  return [...entries, { key: 'order', value: target, range, keyRange: range, valueRange: range }];
}

/**
 * The same pattern with its keys in `target` order. A pattern the engine
 * cannot weave without errors is returned unchanged with those errors, since
 * the thread (and so the conversion) is only known for a whole piece.
 */
export function convertOrder(ast: PatternAst, target: KeyOrder): Result<PatternAst> {
  if (ast.header.order === target) return { value: ast, diagnostics: [] };
  const { value, diagnostics } = compileAst(ast);
  if (hasErrors(diagnostics)) return { value: ast, diagnostics: diagnostics.filter((d) => d.severity === 'error') };
  const keys = keysIn(value.model, target);
  const rowsOfModel = value.model.rows;
  let r = 0;
  const rows: RowNode[] = [];
  for (const node of ast.rows) {
    const converted: ItemNode[][] = [];
    for (let n = node.from; n <= node.to; n++) {
      const ids = rowsOfModel[r++]?.units ?? [];
      let u = 0;
      converted.push(convertItems(node.items, () => keys[ids[u++]!] ?? ''));
    }
    if (converted.every((c) => signature(c) === signature(converted[0]!))) {
      rows.push({ ...node, items: converted[0]! });
      continue;
    }
    converted.forEach((items, k) => {
      const n = node.from + k;
      const split: RowNode = { ...node, from: n, to: n, items, leadingComments: k === 0 ? node.leadingComments : [] };
      if (n !== node.to) delete split.trailingComment;
      rows.push(split);
    });
  }
  return {
    value: { ...ast, header: { ...ast.header, order: target, entries: withOrder(ast.header.entries, target) }, rows },
    diagnostics: [],
  };
}
