// Combinatorial lower bounds on the number of bars for bin packing with one capacity.
// L1: ⌈Σ w / C⌉. L2: Martello & Toth, "Lower bounds and reduction procedures for the bin packing problem",
// Discrete Applied Mathematics 28 (1990) 59–70 — for each threshold K ≤ C/2, items larger than C − K each need their
// own bar, items in (C/2, C − K] need one each, and items in [K, C/2] must fit in what the latter leave or in new bars.

export function materialBound(sizes: ArrayLike<number>, demand: ArrayLike<number>, cap: number): number {
  let s = 0;
  for (let i = 0; i < sizes.length; i++) s += sizes[i] * demand[i];
  return Math.ceil(s / cap - 1e-9);
}

/** Martello–Toth L2 bound. `sizes` strictly decreasing, every size ≤ cap. */
export function martelloTothL2(sizes: ArrayLike<number>, demand: ArrayLike<number>, cap: number): number {
  const n = sizes.length;
  let best = materialBound(sizes, demand, cap);
  // Candidate thresholds: every distinct size ≤ C/2, plus 0.
  const ks: number[] = [0];
  for (let i = 0; i < n; i++) if (sizes[i] * 2 <= cap) ks.push(sizes[i]);
  for (const K of ks) {
    let n1 = 0;
    let n2 = 0;
    let free2 = 0;
    let sum3 = 0;
    for (let i = 0; i < n; i++) {
      const w = sizes[i];
      const d = demand[i];
      if (d === 0) continue;
      if (w > cap - K) n1 += d;
      else if (w * 2 > cap) {
        n2 += d;
        free2 += (cap - w) * d;
      } else if (w >= K) sum3 += w * d;
    }
    const extra = Math.max(0, Math.ceil((sum3 - free2) / cap - 1e-9));
    best = Math.max(best, n1 + n2 + extra);
  }
  return best;
}
