/** Did-you-mean suggestions, shared by every check that meets a word it does not know. */
import { distance } from 'fastest-levenshtein';
import type { Fix, SourceRange } from '../shared/diagnostic.js';

/**
 * Edit distance that counts swapping two neighbouring letters as one edit
 * (optimal string alignment, the restricted Damerau distance). Only run on
 * the few candidates that tie on Levenshtein distance, so its cost is no concern.
 */
function transposeDistance(a: string, b: string): number {
  const d: number[][] = Array.from({ length: a.length + 1 }, (_, i) => [i]);
  for (let j = 1; j <= b.length; j++) d[0]![j] = j;
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let v = Math.min(d[i - 1]![j]! + 1, d[i]![j - 1]! + 1, d[i - 1]![j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) v = Math.min(v, d[i - 2]![j - 2]! + 1);
      d[i]![j] = v;
    }
  }
  return d[a.length]![b.length]!;
}

const sharedPrefix = (a: string, b: string): number => {
  let n = 0;
  while (n < a.length && n < b.length && a[n] === b[n]) n++;
  return n;
};

/**
 * The closest candidate, if it is close enough to be a plausible typo: at most
 * two edits, and fewer than half the word's letters (so `xy` does not become `row`).
 * Candidates the same number of edits away are ranked as a typist errs: two
 * swapped letters (`tael` is `teal`, not `tan`), then the longer shared start,
 * then the candidate listed first.
 */
export function closest(word: string, candidates: Iterable<string>): string | undefined {
  const w = word.toLowerCase();
  let best: string | undefined;
  let bestRank: number[] = [Infinity];
  for (const c of candidates) {
    const lc = c.toLowerCase();
    const d = distance(w, lc);
    if (d > bestRank[0]!) continue;
    const rank = [d, transposeDistance(w, lc), -sharedPrefix(w, lc)];
    if (best === undefined || before(rank, bestRank)) {
      best = c;
      bestRank = rank;
    }
  }
  const d = bestRank[0]!;
  return best !== undefined && d > 0 && d <= Math.min(2, Math.ceil(w.length / 2)) ? best : undefined;
}

/** Lexicographic order on ranks; equal ranks keep the earlier candidate. */
function before(a: readonly number[], b: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! < b[i]!;
  return false;
}

/** "; did you mean 'x'?" or nothing, to append to a message (messages end without a full stop). */
export const didYouMean = (word: string, candidates: Iterable<string>): string => {
  const c = closest(word, candidates);
  return c === undefined ? '' : `; did you mean '${c}'?`;
};

/** The did-you-mean text and, when there is a suggestion, the fix that writes it over `range`. */
export function suggest(word: string, candidates: Iterable<string>, range: SourceRange): { text: string; fix?: Fix } {
  const c = closest(word, candidates);
  return c === undefined
    ? { text: '' }
    : { text: `; did you mean '${c}'?`, fix: { title: `write '${c}'`, range, replacement: c } };
}
