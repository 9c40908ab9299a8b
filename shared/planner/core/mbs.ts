// Minimum bin slack (Fleszar & Hindi, "New heuristics for one-dimensional bin-packing", Computers & Operations
// Research 29 (2002) 821–839), variant MBS': each new bar gets the largest item left, then the subset of the other
// items left that fills the rest best, found by enumerating subsets in non-increasing size order and stopping at an
// exact fill. The paper reports it at the optimum on most of the classic test lists (figures recalled from memory),
// where first/best fit often stay a bar or more above. Restarts (our own sampling, simpler than the paper's): the
// enumeration visits the sizes in a randomly perturbed order, so among subsets of equal slack a different one is
// kept, and the whole packing is redone until it meets the target or the time runs out.

export interface MbsOptions {
  /** Stop as soon as a packing uses this many bars (a proven lower bound). */
  target: number;
  /** Absolute time (per `now`) after which no new restart begins. */
  deadline: number;
  now: () => number;
  /** Most packings tried, the deterministic one included. */
  maxTries?: number;
  /** Enumeration nodes per bar before the best subset so far is kept. */
  nodeLimit?: number;
  seed?: number;
}

/**
 * Packs `demand[i]` items of `sizes[i]` (strictly decreasing, each ≤ cap) into bars of capacity `cap`. Returns the
 * bars of the packing with the fewest bars found (the first such), each as counts over the sizes.
 */
export function mbsPack(sizes: ArrayLike<number>, demand: ArrayLike<number>, cap: number, opts: MbsOptions): Int32Array[] {
  const maxTries = opts.maxTries ?? 1000;
  const nodeLimit = opts.nodeLimit ?? 20000;
  let seed = (opts.seed ?? 987654321) & 0x7fffffff;
  const rng = (): number => {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    return seed / 0x80000000;
  };
  let best: Int32Array[] | null = null;
  for (let t = 0; t < maxTries; t++) {
    if (t > 0 && opts.now() > opts.deadline) break;
    const bars = packOnce(sizes, demand, cap, nodeLimit, t === 0 ? null : rng);
    if (best === null || bars.length < best.length) best = bars;
    if (best.length <= opts.target) break;
  }
  return best ?? [];
}

function packOnce(
  sizes: ArrayLike<number>,
  demand: ArrayLike<number>,
  cap: number,
  nodeLimit: number,
  rng: (() => number) | null,
): Int32Array[] {
  const n = sizes.length;
  const rem = Int32Array.from(demand);
  let left = 0;
  for (let i = 0; i < n; i++) left += rem[i];
  const bars: Int32Array[] = [];
  const cur = new Int32Array(n);
  const bestSet = new Int32Array(n);
  // Visiting order of the sizes in the enumeration: decreasing, or decreasing with a random local shuffle.
  const order = Int32Array.from({ length: n }, (_, i) => i);
  let bestRoom = 0;
  let nodes = 0;

  const search = (k: number, room: number): boolean => {
    if (room < bestRoom) {
      bestRoom = room;
      bestSet.set(cur);
      if (room === 0) return true;
    }
    for (let q = k; q < n; q++) {
      if (++nodes > nodeLimit) return true;
      const i = order[q];
      if (rem[i] === 0 || sizes[i] > room) continue;
      rem[i]--;
      cur[i]++;
      const stop = search(q, room - sizes[i]);
      cur[i]--;
      rem[i]++;
      if (stop) return true;
    }
    return false;
  };

  while (left > 0) {
    let first = 0;
    while (rem[first] === 0) first++;
    rem[first]--;
    if (rng) {
      // Swap neighbours at random: keeps the order nearly decreasing (so good fills come early) but varies ties.
      for (let q = 0; q < n; q++) order[q] = q;
      for (let q = 0; q + 1 < n; q++) {
        if (rng() < 0.5) {
          const a = order[q];
          order[q] = order[q + 1];
          order[q + 1] = a;
        }
      }
    }
    cur.fill(0);
    bestSet.fill(0);
    bestRoom = cap - sizes[first];
    nodes = 0;
    search(0, cap - sizes[first]);
    const bar = Int32Array.from(bestSet);
    bar[first]++;
    for (let i = 0; i < n; i++) {
      rem[i] -= bestSet[i];
      left -= bar[i];
    }
    bars.push(bar);
  }
  return bars;
}
