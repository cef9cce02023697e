/** Did-you-mean suggestions, shared by every check that meets a word it does not know. */
import { distance } from 'fastest-levenshtein';
import type { Fix, SourceRange } from '../shared/diagnostic.js';

/**
 * The closest candidate, if it is close enough to be a plausible typo: at most
 * two edits, and fewer than half the word's letters (so `xy` does not become `row`).
 */
export function closest(word: string, candidates: Iterable<string>): string | undefined {
  const w = word.toLowerCase();
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const c of candidates) {
    const d = distance(w, c.toLowerCase());
    if (d < bestDistance) {
      best = c;
      bestDistance = d;
    }
  }
  return best !== undefined && bestDistance > 0 && bestDistance <= Math.min(2, Math.ceil(w.length / 2))
    ? best
    : undefined;
}

/** " Did you mean 'x'?" or nothing, to append to a message. */
export const didYouMean = (word: string, candidates: Iterable<string>): string => {
  const c = closest(word, candidates);
  return c === undefined ? '' : ` Did you mean '${c}'?`;
};

/** The did-you-mean text and, when there is a suggestion, the fix that writes it over `range`. */
export function suggest(word: string, candidates: Iterable<string>, range: SourceRange): { text: string; fix?: Fix } {
  const c = closest(word, candidates);
  return c === undefined
    ? { text: '' }
    : { text: ` Did you mean '${c}'?`, fix: { title: `write '${c}'`, range, replacement: c } };
}
