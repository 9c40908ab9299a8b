// Perfect packing as an exact cover: when every bar must be filled exactly and few part subsets fill a bar exactly
// (lists whose bars each hold about three parts of varied lengths), list every such subset of up to four parts; the
// search that picks bars among them is ./cover-search.

/** Most subsets listed; past it exact fills are plentiful and the bar-by-bar search (./perfect-fill) suits better. */
const MAX_SUBSETS = 60_000;

/**
 * Every subset of at most `maxParts` (3 or 4) parts that fills a bar exactly, as item indices (repeated for several
 * parts of one length), or null when there are more than MAX_SUBSETS.
 */
export function exactFillSets(sizes: ArrayLike<number>, demand: ArrayLike<number>, cap: number, maxParts: number): number[][] | null {
  const n = sizes.length;
  const index = new Map<number, number>();
  for (let i = 0; i < n; i++) if (demand[i] > 0) index.set(sizes[i], i);
  const sets: number[][] = [];
  // Indices i ≤ j ≤ k ≤ l (sizes non-increasing); a repeated index needs that many parts of the length.
  const enough = (idx: number[]): boolean => {
    for (let a = 0; a < idx.length; a++) {
      let c = 0;
      for (let b = 0; b < idx.length; b++) if (idx[b] === idx[a]) c++;
      if (c > demand[idx[a]]) return false;
    }
    return true;
  };
  const add = (idx: number[]): boolean => {
    if (enough(idx)) sets.push(idx);
    return sets.length <= MAX_SUBSETS;
  };
  const live: number[] = [];
  for (let i = 0; i < n; i++) if (demand[i] > 0) live.push(i);
  const lookup = (v: number, from: number): number => {
    const k = index.get(v);
    return k !== undefined && k >= from ? k : -1;
  };
  for (let a = 0; a < live.length; a++) {
    const i = live[a];
    const ri = cap - sizes[i];
    if (ri === 0 && !add([i])) return null;
    const k2 = lookup(ri, i);
    if (k2 >= 0 && !add([i, k2])) return null;
    for (let b = a; b < live.length; b++) {
      const j = live[b];
      const rj = ri - sizes[j];
      if (rj <= 0) continue;
      // The rest must be made of parts no longer than j's: with at most two of them it is ≤ 2·size j.
      if (rj > 2 * sizes[j]) break;
      const k3 = lookup(rj, j);
      if (k3 >= 0 && !add([i, j, k3])) return null;
      for (let c = b; maxParts >= 4 && c < live.length; c++) {
        const k = live[c];
        const rk = rj - sizes[k];
        if (rk <= 0) continue;
        if (rk > sizes[k]) break;
        const l = lookup(rk, k);
        if (l >= 0 && !add([i, j, k, l])) return null;
      }
    }
  }
  return sets;
}
