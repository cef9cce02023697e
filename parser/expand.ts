/**
 * Expanding a row: groups and their repeats written out as a flat list of the
 * unit and skip nodes themselves, so each entry keeps its source range (a
 * repeated unit appears once per repetition, as the same node).
 */
import type { Result } from '../shared/diagnostic.js';
import type { ItemNode, RowNode, SkipNode, UnitNode } from './ast.js';
import { countItems, UNIT_LIMIT } from './limits.js';

export type FlatItem = UnitNode | SkipNode;

/** The row's units and skips in order of work; refused (empty, `too-large`) past `limit` entries. */
export function expandRow(row: Pick<RowNode, 'items' | 'range'>, limit: number = UNIT_LIMIT): Result<FlatItem[]> {
  const count = countItems(row.items);
  if (count > limit) {
    return {
      value: [],
      diagnostics: [
        {
          severity: 'error',
          id: 'too-large',
          message: `this row expands to ${count.toLocaleString('en')} units and skips; the limit is ${limit.toLocaleString('en')}`,
          range: row.range,
          hint: 'check the repeat counts',
        },
      ],
    };
  }
  const out: FlatItem[] = [];
  pushItems(row.items, out);
  return { value: out, diagnostics: [] };
}

function pushItems(items: readonly ItemNode[], out: FlatItem[]): void {
  for (const item of items) {
    if (item.type !== 'group') out.push(item);
    else for (let k = 0; k < item.times; k++) pushItems(item.items, out);
  }
}
