/**
 * Rule 4 of the thread: the shortest route through beads already in place,
 * never straight back into the bead just left, ties broken bead by bead in
 * favour of the bead added later. A breadth-first search over (bead left,
 * junction) states; each layer is kept in the order of preference, so the
 * first state to reach the target carries the preferred route.
 */

/** Beads by junction (compressed rows), each bead's two ends, and pick-up ranks (-1: not yet in place). */
export interface Net {
  start: Int32Array;
  at: Int32Array;
  ends: readonly number[];
  rank: readonly number[];
  /** Search scratch: the search number that last saw each (bead, end) state, so no search clears it. */
  seen: Int32Array;
  search: number;
}

// Scratch state lists shared by every search (searches never overlap), so a search allocates only its result.
const stJ: number[] = [];
const stBead: number[] = [];
const stParent: number[] = [];
const options: number[] = [];

/** True when route `a` is preferred to route `b`: shorter, or at the first differing bead the later-added one. */
export function preferRoute(rank: readonly number[], a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return a.length < b.length;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return rank[a[i]!]! > rank[b[i]!]!;
  return false;
}

/** The preferred route from junction `from` (having just left bead `last`, -1 for none) to `target`, or null past `limit` beads. */
export function findRoute(net: Net, from: number, last: number, target: number, limit: number): number[] | null {
  if (from === target) return [];
  const search = ++net.search;
  stJ.length = stBead.length = stParent.length = 0;
  stJ.push(from);
  stBead.push(last);
  stParent.push(-1);
  let begin = 0;
  for (let depth = 1; depth <= limit && begin < stJ.length; depth++) {
    const end = stJ.length;
    for (let s = begin; s < end; s++) {
      const j = stJ[s]!;
      options.length = 0;
      for (let i = net.start[j]!; i < net.start[j + 1]!; i++) {
        const b = net.at[i]!;
        if (b !== stBead[s] && net.rank[b]! >= 0) insertByRank(net.rank, b);
      }
      for (const b of options) {
        const out = net.ends[2 * b] === j ? net.ends[2 * b + 1]! : net.ends[2 * b]!;
        const key = 2 * b + (out === net.ends[2 * b] ? 0 : 1);
        if (net.seen[key] === search) continue;
        net.seen[key] = search;
        stJ.push(out);
        stBead.push(b);
        stParent.push(s);
        if (out === target) return unwind(stJ.length - 1);
      }
    }
    begin = end;
  }
  return null;
}

/** Keeps `options` in falling rank: the later-added bead first. */
function insertByRank(rank: readonly number[], b: number): void {
  let i = options.length;
  options.push(b);
  while (i > 0 && rank[options[i - 1]!]! < rank[b]!) {
    options[i] = options[i - 1]!;
    i--;
  }
  options[i] = b;
}

/** The route to state `id`, in an array of exactly its length (the model keeps it as a unit's `moveOn`). */
function unwind(id: number): number[] {
  let length = 0;
  for (let s = id; stParent[s]! !== -1; s = stParent[s]!) length++;
  const route = new Array<number>(length);
  for (let s = id; stParent[s]! !== -1; s = stParent[s]!) route[--length] = stBead[s]!;
  return route;
}
