/**
 * What header values and colours mean: the known keys, bead sizes, layouts,
 * key orders and colour spellings of NOTATION.md section 2.
 */
import { colorsNamed } from '../shared/culori.js';
import type { Diagnostic, SourceRange } from '../shared/diagnostic.js';
import type { BeadShape, Header, HeaderEntry, KeyOrder, Layout } from './ast.js';
import { suggest } from './suggest.js';

/** The header keys in the order `fmt` writes them. */
export const HEADER_KEYS = [
  'title',
  'designer',
  'beads',
  'layout',
  'order',
  'thread',
  'description',
  'license',
] as const;
export const BEAD_SIZES = ['15/0 round', '11/0 round', '8/0 round', '6/0 round', '11/0 cylinder'] as const;
export const LAYOUTS: readonly Layout[] = ['flat', 'tube', 'round'];
export const ORDERS: readonly KeyOrder[] = ['pickup', 'placed'];
export const ROW_WORDS = ['row', 'rows', 'round', 'rounds'] as const;
/** Line keys that are not header entries. `colours:` is accepted for `colors:`. */
export const COLORS_KEYS = ['colors', 'colours'] as const;
export const NOTE_KEY = 'note';
export const LOWER_CASE_HINT = 'a colour key is one capital letter A-Z';

/** CSS Color 4 names, lower case, to 0xRRGGBB. */
const NAMED: ReadonlyMap<string, number> = new Map(Object.entries(colorsNamed as Record<string, number>));
export const COLOR_NAMES: readonly string[] = [...NAMED.keys()];

const hex2 = (n: number): string => n.toString(16).padStart(2, '0');

/** `#RGB`, `#RRGGBB` or a CSS name (any case) to lower-case `#rrggbb`, or null. */
export function colorHex(written: string): string | null {
  const m = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(written);
  if (m) {
    const h = m[1]!.toLowerCase();
    return h.length === 3 ? `#${h[0]}${h[0]}${h[1]}${h[1]}${h[2]}${h[2]}` : `#${h}`;
  }
  const n = /^[a-z]+$/i.test(written) ? NAMED.get(written.toLowerCase()) : undefined;
  return n === undefined ? null : `#${hex2((n >> 16) & 255)}${hex2((n >> 8) & 255)}${hex2(n & 255)}`;
}

export function badColor(key: string, written: string, range: SourceRange): Diagnostic {
  if (written.startsWith('#')) {
    return {
      severity: 'error',
      id: 'bad-color',
      message: `colour '${key}': '${written}' is not a hex colour`,
      range,
      hint: "write 3 or 6 hex digits after '#', like '#2e6f8e' or '#fa0'",
    };
  }
  const s = suggest(written, COLOR_NAMES, range);
  return {
    severity: 'error',
    id: 'bad-color',
    message: `colour '${key}': '${written}' is not a CSS colour name${s.text}`,
    range,
    hint: "use a CSS Color 4 name (like 'teal' or 'rebeccapurple') or a hex colour like '#2e6f8e'",
    ...(s.fix ? { fix: s.fix } : {}),
  };
}

const WHAT: Record<string, string> = { beads: 'bead size and shape', layout: 'layout', order: 'key order' };

function enumError(entry: HeaderEntry, allowed: readonly string[]): Diagnostic {
  const s = suggest(entry.value, allowed, entry.valueRange);
  return {
    severity: 'error',
    id: 'bad-header-value',
    message: `'${entry.value}' is not a ${WHAT[entry.key] ?? entry.key}${s.text}`,
    range: entry.valueRange,
    hint: `${entry.key} is one of: ${allowed.join(', ')}`,
    ...(s.fix ? { fix: s.fix } : {}),
  };
}

/** The header with defaults, from the entries as written (first of a repeated key wins). */
export function readHeader(entries: HeaderEntry[]): { header: Header; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const header: Header = {
    title: '',
    beads: { size: '11/0', shape: 'round' },
    layout: 'flat',
    order: 'pickup',
    entries,
  };
  const seen = new Map<string, HeaderEntry>();
  for (const entry of entries) {
    const first = seen.get(entry.key);
    if (first) {
      diagnostics.push({
        severity: 'error',
        id: 'duplicate-key',
        message: `'${entry.key}' is given twice; the first, on line ${first.range.line}, is used`,
        range: entry.keyRange,
        hint: `keep one '${entry.key}:' line`,
      });
      continue;
    }
    seen.set(entry.key, entry);
    const v = entry.value;
    switch (entry.key) {
      case 'title':
      case 'designer':
      case 'thread':
      case 'description':
      case 'license':
        header[entry.key] = v;
        break;
      case 'beads': {
        const b = normaliseBeads(v);
        if ((BEAD_SIZES as readonly string[]).includes(b)) {
          const [size, shape] = b.split(' ') as [string, BeadShape];
          header.beads = { size, shape };
        } else diagnostics.push(enumError(entry, BEAD_SIZES));
        break;
      }
      case 'layout': {
        const w = LAYOUTS.find((l) => l === v.toLowerCase());
        if (w) header.layout = w;
        else diagnostics.push(enumError(entry, LAYOUTS));
        break;
      }
      case 'order': {
        const w = ORDERS.find((o) => o === v.toLowerCase());
        if (w) header.order = w;
        else diagnostics.push(enumError(entry, ORDERS));
        break;
      }
    }
  }
  if (header.title === '') {
    const t = seen.get('title');
    diagnostics.push({
      severity: 'error',
      id: 'missing-title',
      message: t ? 'the title is empty' : 'the pattern has no title',
      range: t ? t.range : { line: 1, column: 1, endLine: 1, endColumn: 1, offset: 0, endOffset: 0 },
      hint: "add a line like 'title: Kestrel Fan' at the top",
    });
  }
  return { header, diagnostics };
}

/** `11/0  Round` -> `11/0 round`; a size alone means round beads. */
export function normaliseBeads(v: string): string {
  const b = v.trim().toLowerCase().replace(/\s+/g, ' ');
  return /^\d+\/0$/.test(b) ? `${b} round` : b;
}
