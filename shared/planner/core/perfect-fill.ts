// Perfect packing: when the parts add up to exactly a whole number of bars and the bound asks for that many, every
// bar must be filled to the last unit. Each bar takes the largest part left and is completed by a subset of the others
// summing exactly to the room left; a subset-sum table over the parts left (bounded multiplicities, Bellman's dynamic
// programme as a bit set) lists only completions that exist, so the search never walks into a dead end inside one bar,
// and the last bar is always exact. Completions are tried largest parts first (the small ones are kept to fill the
// last bars), with depth-first backtracking across bars and randomised restarts; a node budget keeps it bounded.
import { coverSearch } from './cover-search';
import { exactFillSets } from './exact-cover';

export interface PerfectFillOptions {
  /** Most bars placed in all, over every restart (deterministic for a given job). */
  nodeLimit: number;
  /** Bars placed per restart before it gives up and the next one begins. */
  restartNodes: number;
  outOfTime: () => boolean;
}

export interface PartialFill {
  /** Bars filled exactly. */
  bars: Int32Array[];
  /** Parts not yet placed (counts over the sizes); all zero when the packing is complete. */
  rest: Int32Array;
}

/** Completions kept per bar, best first: the search backtracks among these only. */
const COMPLETIONS_PER_BAR = 6;

/**
 * Packs `demand[i]` parts of `sizes[i]` (strictly decreasing, each ≤ cap, adding up to exactly a multiple of cap)
 * into bars filled exactly. When the budget runs out first, returns the deepest partial packing met (its bars exact,
 * the rest unplaced); null when the total is no multiple of cap.
 */
export function perfectFill(
  sizes: ArrayLike<number>,
  demand: ArrayLike<number>,
  cap: number,
  opts: PerfectFillOptions,
  seed = 0x2545f491,
): PartialFill | null {
  const n = sizes.length;
  let total = 0;
  for (let i = 0; i < n; i++) total += sizes[i] * demand[i];
  if (total % cap !== 0) return null;
  const bars = total / cap;
  if (bars === 0) return { bars: [], rest: new Int32Array(n) };
  const words = (cap >> 5) + 1;
  const rem = Int32Array.from(demand);
  // One table, rebuilt at each bar: row a (`words` 32-bit words from a·words) holds the sums reachable with the
  // parts of the active sizes a… (the sizes with parts left, largest first).
  let reach = new Uint32Array(0);
  const active = new Int32Array(n);
  const rng = (): number => {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    return seed / 0x80000000;
  };
  let nodes = 0;
  let restartLeft = 0;
  let noise = 0;
  const out: Int32Array[] = [];
  const stopped = (): boolean => nodes > opts.nodeLimit || restartLeft < 0;
  let deepest: PartialFill = { bars: [], rest: Int32Array.from(demand) };
  const has = (a: number, v: number): boolean => ((reach[a * words + (v >> 5)] >>> (v & 31)) & 1) === 1;

  /** Completions of a bar whose first part is `first` (already taken from rem), best first. */
  const completions = (first: number, target: number): Int32Array[] => {
    if (target === 0) return [Int32Array.from({ length: n }, (_, i) => (i === first ? 1 : 0))];
    let m = 0;
    for (let i = 0; i < n; i++) if (rem[i] > 0 && sizes[i] <= target) active[m++] = i;
    if (reach.length < (m + 1) * words) reach = new Uint32Array((m + 1) * words);
    const w = (target >> 5) + 1;
    reach.fill(0, m * words, m * words + w);
    reach[m * words] = 1;
    for (let a = m - 1; a >= 0; a--) {
      const i = active[a];
      reach.copyWithin(a * words, (a + 1) * words, (a + 1) * words + w);
      // Bounded multiplicity by binary splitting: chunks of 1, 2, 4, … copies, each a 0/1 choice.
      let left = rem[i];
      for (let c = 1; left > 0; c *= 2) {
        const take = Math.min(c, left);
        left -= take;
        if (take * sizes[i] > target) break;
        orShifted(reach, a * words, w, take * sizes[i]);
      }
    }
    const found: Int32Array[] = [];
    const cur = new Int32Array(n);
    cur[first] = 1;
    // Largest parts first: at each size take as many as still leave a reachable rest, then fewer; taking none moves
    // on in the loop, so the stack stays a few frames deep.
    const walk = (a: number, t: number): void => {
      if (t === 0) {
        found.push(Int32Array.from(cur));
        return;
      }
      for (; a < m && found.length < COMPLETIONS_PER_BAR; a++) {
        if (!has(a, t)) return;
        const i = active[a];
        for (let c = Math.min(rem[i], Math.floor(t / sizes[i])); c >= 1; c--) {
          if (!has(a + 1, t - c * sizes[i])) continue;
          cur[i] += c;
          walk(a + 1, t - c * sizes[i]);
          cur[i] -= c;
          if (found.length >= COMPLETIONS_PER_BAR) return;
        }
        // On restarts, sometimes leave a size for later bars.
        if (noise > 0 && rng() < noise) a++;
      }
    };
    walk(0, target);
    return found;
  };

  const place = (depth: number): boolean => {
    if (depth === bars - 1) {
      out.push(Int32Array.from(rem));
      deepest = { bars: out.slice(), rest: new Int32Array(n) };
      return true;
    }
    if (depth > deepest.bars.length) deepest = { bars: out.map((b) => Int32Array.from(b)), rest: Int32Array.from(rem) };
    if (++nodes > opts.nodeLimit || --restartLeft < 0 || ((nodes & 63) === 0 && opts.outOfTime())) return false;
    let first = 0;
    while (rem[first] === 0) first++;
    rem[first]--;
    const list = completions(first, cap - sizes[first]);
    rem[first]++;
    for (const bar of list) {
      for (let i = 0; i < n; i++) rem[i] -= bar[i];
      out.push(bar);
      if (place(depth + 1)) return true;
      out.pop();
      for (let i = 0; i < n; i++) rem[i] += bar[i];
      if (stopped()) return false;
    }
    return false;
  };

  for (let attempt = 0; nodes < opts.nodeLimit && !opts.outOfTime(); attempt++) {
    restartLeft = opts.restartNodes;
    noise = attempt === 0 ? 0 : 0.05 + 0.2 * rng();
    out.length = 0;
    if (place(0)) break;
  }
  return deepest;
}

/** row |= row << shift over its first `w` words (bit v is the sum v), high words first so each part counts once. */
function orShifted(a: Uint32Array, row: number, w: number, shift: number): void {
  const ws = shift >> 5;
  const bs = shift & 31;
  for (let k = w - 1; k >= ws; k--) {
    let v = bs === 0 ? a[row + k - ws] : a[row + k - ws] << bs;
    if (bs !== 0 && k - ws - 1 >= 0) v |= a[row + k - ws - 1] >>> (32 - bs);
    a[row + k] |= v;
  }
}

/** Largest table (32-bit words) the bar-by-bar search may build; beyond it (long bars in fine units) it is skipped. */
const MAX_TABLE_WORDS = 4_000_000;

/**
 * Most parts for the exact cover: on longer three-part lists (500 parts) it seldom ends within its budget, and the
 * time is better left to the LP and its dives.
 */
const MAX_COVER_PIECES = 320;

export interface PerfectPackOptions {
  /** Bars placed by the bar-by-bar search, and subsets taken (search and probes) by the exact-cover search. */
  fillNodes: number;
  coverWork: number;
  outOfTime: () => boolean;
}

/**
 * A perfect packing of parts adding up to exactly a whole number of bars, by two searches: bar by bar (./perfectFill;
 * lists with many parts of varied lengths to a bar, where exact fills abound) and as an exact cover of the few subsets
 * of up to three or four parts that fill a bar (./cover-search; lists of about three parts to a bar). Lists of at most
 * three parts to a bar on average go to the exact cover first. Null when neither finds one.
 */
export function perfectPack(sizes: ArrayLike<number>, demand: ArrayLike<number>, cap: number, opts: PerfectPackOptions): Int32Array[] | null {
  let active = 0;
  let pieces = 0;
  let total = 0;
  for (let i = 0; i < sizes.length; i++) {
    if (demand[i] > 0) active++;
    pieces += demand[i];
    total += sizes[i] * demand[i];
  }
  if (total % cap !== 0) return null;
  const bars = total / cap;
  const cover = (): Int32Array[] | null => {
    if (opts.outOfTime() || pieces > MAX_COVER_PIECES || pieces > 4 * bars) return null;
    const sets = exactFillSets(sizes, demand, cap, pieces <= 3 * bars ? 3 : 4);
    return sets ? coverSearch(sizes, demand, sets, { workLimit: opts.coverWork, outOfTime: opts.outOfTime }) : null;
  };
  const fill = (): Int32Array[] | null => {
    if (opts.outOfTime() || (active + 1) * ((cap >> 5) + 1) > MAX_TABLE_WORDS) return null;
    const r = perfectFill(sizes, demand, cap, { nodeLimit: opts.fillNodes, restartNodes: opts.fillNodes, outOfTime: opts.outOfTime });
    return r && r.rest.every((c) => c === 0) ? r.bars : null;
  };
  return pieces <= 3 * bars ? (cover() ?? fill()) : (fill() ?? cover());
}
