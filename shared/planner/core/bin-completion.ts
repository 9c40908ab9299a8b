// Exhaustive packing into a given number of bars by bin completion (Korf, "A new algorithm for optimal bin packing",
// AAAI-02, 731–736): each bar starts with the largest part left and is completed by a subset of the others whose
// waste fits in what the bar count allows (bars × capacity − Σ sizes); completions are tried fullest first, with
// backtracking across bars. With little room to spare (exactly filled lists) almost every branch is cut at once.

/**
 * Packs `demand[i]` parts of `sizes[i]` (strictly decreasing, each ≤ cap) into at most `bars` bars, or returns null
 * when none exists or the search passes `nodeLimit` nodes (search and enumeration steps together).
 */
export function packIntoBars(
  sizes: ArrayLike<number>,
  demand: ArrayLike<number>,
  cap: number,
  bars: number,
  nodeLimit: number,
): Int32Array[] | null {
  const n = sizes.length;
  const rem = Int32Array.from(demand);
  let total = 0;
  for (let i = 0; i < n; i++) total += sizes[i] * rem[i];
  if (total > bars * cap) return null;
  const out: Int32Array[] = [];
  const cur = new Int32Array(n);
  let nodes = 0;

  // Completions of one bar: every subset of the parts left (from index k on) with load in [minFill, room].
  const complete = (k: number, room: number, minFill: number, load: number, found: Int32Array[]): void => {
    if (load >= minFill) found.push(Int32Array.from(cur));
    if (found.length > MAX_COMPLETIONS || ++nodes > nodeLimit) return;
    for (let i = k; i < n; i++) {
      if (rem[i] === 0 || sizes[i] > room) continue;
      rem[i]--;
      cur[i]++;
      complete(i, room - sizes[i], minFill, load + sizes[i], found);
      cur[i]--;
      rem[i]++;
      if (found.length > MAX_COMPLETIONS || nodes > nodeLimit) return;
    }
  };

  const search = (barsLeft: number, waste: number): boolean => {
    if (++nodes > nodeLimit) return false;
    let first = 0;
    while (first < n && rem[first] === 0) first++;
    if (first === n) return true;
    if (barsLeft === 0) return false;
    rem[first]--;
    cur.fill(0);
    const found: Int32Array[] = [];
    complete(first, cap - sizes[first], cap - sizes[first] - waste, 0, found);
    if (nodes > nodeLimit) {
      rem[first]++;
      return false;
    }
    const loads = found.map((c) => {
      let s = 0;
      for (let i = 0; i < n; i++) s += c[i] * sizes[i];
      return s;
    });
    const order = found.map((_, k) => k).sort((a, b) => loads[b] - loads[a]);
    for (const k of order) {
      const c = found[k];
      for (let i = 0; i < n; i++) rem[i] -= c[i];
      const bar = Int32Array.from(c);
      bar[first]++;
      out.push(bar);
      if (search(barsLeft - 1, waste - (cap - sizes[first] - loads[k]))) return true;
      out.pop();
      for (let i = 0; i < n; i++) rem[i] += c[i];
      if (nodes > nodeLimit) break;
    }
    rem[first]++;
    return false;
  };

  return search(bars, bars * cap - total) ? out : null;
}

/** Completions kept per bar: enough for every exact fill of a few dozen parts, bounded for long lists of small parts. */
const MAX_COMPLETIONS = 400;
