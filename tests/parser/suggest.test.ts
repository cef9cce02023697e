/** Did-you-mean ranking: edit distance first, then how a typist errs. */
import { describe, expect, test } from 'vitest';
import { closest } from '../../parser/suggest.js';
import { COLOR_NAMES, HEADER_KEYS, ROW_WORDS } from '../../parser/values.js';

describe('closest', () => {
  test('two swapped letters beat another word the same Levenshtein distance away', () => {
    // 'tael' is two edits from both 'tan' and 'teal'; only 'teal' is one swap away.
    // Source: CSS Color Module Level 4, section 6.1 (named colours), via culori's list.
    expect(COLOR_NAMES).toContain('tan');
    expect(closest('tael', COLOR_NAMES)).toBe('teal');
    expect(closest('tael', ['tan', 'teal'])).toBe('teal');
    expect(closest('tael', ['teal', 'tan'])).toBe('teal');
  });

  test('header keys and keywords get the swap too', () => {
    expect(closest('tilte', HEADER_KEYS)).toBe('title');
    expect(closest('layuot', HEADER_KEYS)).toBe('layout');
    expect(closest('rwo', ROW_WORDS)).toBe('row');
    expect(closest('ruond', ROW_WORDS)).toBe('round');
  });

  test('then the longer shared start, then the order of the list', () => {
    expect(closest('cat', ['bat', 'cut'])).toBe('cut');
    expect(closest('cat', ['cut', 'bat'])).toBe('cut');
    expect(closest('cat', ['cot', 'cut'])).toBe('cot');
    expect(closest('cat', ['cut', 'cot'])).toBe('cut');
  });

  test('a closer word still wins over a swap, and far words are not suggested', () => {
    expect(closest('tea', ['tae', 'teal'])).toBe('teal');
    expect(closest('xy', ROW_WORDS)).toBeUndefined();
    expect(closest('teal', ['teal'])).toBeUndefined();
  });
});
