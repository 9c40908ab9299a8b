// Perfect packing as an exact cover: when every bar must be filled exactly and few part subsets fill a bar exactly
// (lists whose bars each hold about three parts of varied lengths), list every such subset of up to four parts and
// pick bars from them by Knuth's Algorithm X ("Dancing links", Millennial Perspectives in Computer Science, 2000):
// always branch on the length with the fewest subsets still usable, which finds the few consistent choices quickly
// where filling bars one after another from the largest part runs into dead ends late.

/** Most subsets listed; past it exact fills are plentiful and the bar-by-bar search (./perfect-fill) suits better. */
const MAX_SUBSETS = 60_000;
/** Nodes of the first try, and the growth of the budget at each restart. */
const RESTART_NODES = 500;
const RESTART_GROWTH = 1.5;

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

/**
 * Bars filled exactly (counts over the sizes) covering every part, chosen among `sets` (./exactFillSets), or null when
 * none exists among them or the search passes `nodeLimit` nodes or the time.
 */
export function exactCoverPack(
  sizes: ArrayLike<number>,
  demand: ArrayLike<number>,
  sets: readonly number[][],
  nodeLimit: number,
  outOfTime: () => boolean,
): Int32Array[] | null {
  const n = sizes.length;
  const setsOf: number[][] = Array.from({ length: n }, () => []);
  sets.forEach((s, id) => {
    for (let a = 0; a < s.length; a++) if (s.indexOf(s[a]) === a) setsOf[s[a]].push(id);
  });
  const rem = Int32Array.from(demand);
  // Each subset as its distinct lengths and how many parts of each it takes.
  const items = sets.map((s) => s.filter((v, a) => s.indexOf(v) === a));
  const needs = sets.map((s, id) => items[id].map((v) => s.filter((x) => x === v).length));
  const usable = (id: number): boolean => {
    const it = items[id];
    const nd = needs[id];
    for (let a = 0; a < it.length; a++) if (nd[a] > rem[it[a]]) return false;
    return true;
  };
  const chosen: number[] = [];
  let nodes = 0;
  let restartAt = 0;
  const search = (): boolean | null => {
    if (++nodes > nodeLimit || nodes > restartAt || ((nodes & 255) === 0 && outOfTime())) return null;
    let pick = -1;
    let fewest = Infinity;
    const count = new Int32Array(n);
    for (let i = 0; i < n; i++) {
      if (rem[i] === 0) continue;
      let c = 0;
      for (const id of setsOf[i]) if (usable(id)) c++;
      count[i] = c;
      if (c < fewest) {
        fewest = c;
        pick = i;
        if (c === 0) return false;
      }
    }
    if (pick < 0) return true;
    // Among the subsets that take it, first those that use up the fewest other subsets' lengths.
    const options = setsOf[pick].filter(usable);
    const cost = (id: number): number => items[id].reduce((s, i) => s + count[i], 0);
    const keys = new Map(options.map((id) => [id, cost(id)]));
    options.sort((a, b) => keys.get(b)! - keys.get(a)!);
    for (const id of options) {
      for (const i of sets[id]) rem[i]--;
      chosen.push(id);
      const r = search();
      if (r !== false) return r;
      chosen.pop();
      for (const i of sets[id]) rem[i]++;
    }
    return false;
  };
  // Restarts with doubling budgets and the subsets in another order: a search that went wrong early rarely recovers.
  let seed = 0x3c6ef372;
  const rng = (): number => {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    return seed / 0x80000000;
  };
  let found = false;
  for (let budget = RESTART_NODES; nodes < nodeLimit && !outOfTime(); budget *= RESTART_GROWTH) {
    restartAt = nodes + budget;
    chosen.length = 0;
    rem.set(Array.from(demand));
    const r = search();
    // A search that ends within its budget has tried every choice: there is no cover among these subsets.
    if (r !== null) {
      found = r;
      break;
    }
    for (const list of setsOf) {
      for (let a = list.length - 1; a > 0; a--) {
        const b = Math.floor(rng() * (a + 1));
        [list[a], list[b]] = [list[b], list[a]];
      }
    }
  }
  if (!found) return null;
  return chosen.map((id) => {
    const bar = new Int32Array(n);
    for (const i of sets[id]) bar[i]++;
    return bar;
  });
}
