// Exact cover of the parts by bars filled exactly, chosen among listed subsets (./exact-cover lists them): a search in
// the manner of Knuth's Algorithm X ("Dancing links", Millennial Perspectives in Computer Science, 2000) that always
// branches on the length with the fewest usable subsets, with two strengthenings from constraint programming. Unit
// propagation: a length left with one usable subset takes it at once. Failed-subset probing (singleton consistency,
// Debruyne & Bessière, IJCAI 1997): before branching, every usable subset is taken on trial and propagated; one that
// leaves some length without a subset is struck out for the whole subtree. On lists of three random parts to a bar
// most wrong choices die in the probe rather than dozens of bars deeper, which is where plain Algorithm X loses its
// time. Part multisets already shown to have no cover are remembered (a 64-bit hash of the counts left), so a state
// reached by another order of choices is not searched twice.

export interface CoverSearchOptions {
  /** Most subsets taken in all (search and probes): the deterministic budget. */
  workLimit: number;
  outOfTime: () => boolean;
}

/**
 * Bars filled exactly (counts over the sizes) covering `demand`, chosen among `sets` (item indices, an index repeated
 * for several parts of one length, each subset adding up to one bar), or null when there is no such cover or the
 * budget runs out first.
 */
export function coverSearch(sizes: ArrayLike<number>, demand: ArrayLike<number>, sets: readonly number[][], opts: CoverSearchOptions): Int32Array[] | null {
  const n = sizes.length;
  const m = sets.length;
  if (m === 0) return Array.prototype.some.call(demand, (d: number) => d > 0) ? null : [];
  const cap = sets[0].reduce((a, i) => a + sizes[i], 0);
  let maxSize = 0;
  let minSize = Infinity;
  // Each subset as its distinct lengths and the parts of each it takes.
  const items: Int32Array[] = [];
  const needs: Int32Array[] = [];
  for (const s of sets) {
    const it = s.filter((v, a) => s.indexOf(v) === a);
    items.push(Int32Array.from(it));
    needs.push(Int32Array.from(it, (v) => s.filter((x) => x === v).length));
    maxSize = Math.max(maxSize, s.length);
    minSize = Math.min(minSize, s.length);
  }
  const setsOfList: number[][] = Array.from({ length: n }, () => []);
  items.forEach((it, id) => it.forEach((i) => setsOfList[i].push(id)));
  const setsOf = setsOfList.map((l) => Int32Array.from(l));

  const rem = Int32Array.from(demand);
  let parts = 0;
  let total = 0;
  for (let i = 0; i < n; i++) {
    parts += rem[i];
    total += rem[i] * sizes[i];
  }
  const live = new Uint8Array(m);
  const count = new Int32Array(n);
  const fits = (id: number): boolean => {
    const it = items[id];
    const nd = needs[id];
    for (let a = 0; a < it.length; a++) if (nd[a] > rem[it[a]]) return false;
    return true;
  };
  for (let id = 0; id < m; id++) {
    if (!fits(id)) continue;
    live[id] = 1;
    for (const i of items[id]) count[i]++;
  }
  // Subsets made unusable since a mark (struck out, or no longer fitting the parts left), and subsets taken.
  const trail: number[] = [];
  const chosen: number[] = [];
  // Lengths whose count of usable subsets fell: propagation looks at these only.
  const touched: number[] = [];
  // Order-free hash of a group's counts left, in two 32-bit halves.
  const mix = (v: number, k: number): number => {
    v = Math.imul(v ^ (v >>> 16), k);
    v = Math.imul(v ^ (v >>> 15), 0x846ca68b);
    return (v ^ (v >>> 16)) >>> 0;
  };
  const failed = new Set<string>();
  let work = 0;
  let aborted = false;

  const drop = (id: number): void => {
    live[id] = 0;
    trail.push(id);
    for (const j of items[id]) {
      count[j]--;
      touched.push(j);
    }
  };
  const take = (id: number): void => {
    work++;
    chosen.push(id);
    const it = items[id];
    const nd = needs[id];
    for (let a = 0; a < it.length; a++) {
      const i = it[a];
      rem[i] -= nd[a];
      parts -= nd[a];
      total -= nd[a] * sizes[i];
    }
    for (const i of it) for (const t of setsOf[i]) if (live[t] === 1 && !fits(t)) drop(t);
  };
  const undo = (trailMark: number, chosenMark: number): void => {
    while (trail.length > trailMark) {
      const id = trail.pop()!;
      live[id] = 1;
      for (const j of items[id]) count[j]++;
    }
    while (chosen.length > chosenMark) {
      const id = chosen.pop()!;
      const it = items[id];
      const nd = needs[id];
      for (let a = 0; a < it.length; a++) {
        const i = it[a];
        rem[i] += nd[a];
        parts += nd[a];
        total += nd[a] * sizes[i];
      }
    }
  };
  /** Takes forced subsets until none is left; false on a length with parts left and no usable subset. */
  const propagate = (): boolean => {
    // Every bar left holds between minSize and maxSize parts.
    const bars = total / cap;
    if (parts > maxSize * bars || parts < minSize * bars) {
      touched.length = 0;
      return false;
    }
    while (touched.length > 0) {
      const i = touched.pop()!;
      if (rem[i] === 0) continue;
      if (count[i] === 0) {
        touched.length = 0;
        return false;
      }
      if (count[i] > 1) continue;
      let only = -1;
      for (const t of setsOf[i]) if (live[t] === 1) only = t;
      take(only);
      // Several parts of this length may need the same subset again.
      touched.push(i);
      const b = total / cap;
      if (parts > maxSize * b || parts < minSize * b) {
        touched.length = 0;
        return false;
      }
    }
    return true;
  };
  const spent = (): boolean => {
    if (work > opts.workLimit || ((work & 255) === 0 && opts.outOfTime())) aborted = true;
    return aborted;
  };
  // Subsets still usable after a trial of each (more is a less constraining choice), for the branching order.
  const after = new Float64Array(m);

  const seen = new Int32Array(Math.max(n, m));
  let stamp = 0;
  /** The lengths of `c` with parts left, split into groups that no usable subset joins, smallest first. */
  const groups = (c: readonly number[]): number[][] => {
    const out: number[][] = [];
    stamp++;
    for (const s of c) {
      if (rem[s] === 0 || seen[s] === stamp) continue;
      const g = [s];
      seen[s] = stamp;
      for (let q = 0; q < g.length; q++) {
        for (const t of setsOf[g[q]]) {
          if (live[t] === 0) continue;
          for (const j of items[t]) {
            if (seen[j] !== stamp) {
              seen[j] = stamp;
              g.push(j);
            }
          }
        }
      }
      out.push(g);
    }
    return out.sort((a, b) => a.length - b.length);
  };
  /** Covers the parts left of the lengths in `c`: group by group, each on its own (no usable subset joins two). */
  const solve = (c: readonly number[]): boolean => {
    const trailMark = trail.length;
    const chosenMark = chosen.length;
    for (const g of groups(c)) {
      if (!group(g)) {
        undo(trailMark, chosenMark);
        return false;
      }
    }
    return true;
  };
  /** Covers one group of lengths joined by usable subsets; remembers the groups (lengths and counts) that fail. */
  const group = (g: number[]): boolean => {
    let k1 = 0;
    let k2 = 0;
    let gParts = 0;
    let gTotal = 0;
    for (const i of g) {
      const v = i * 1024 + rem[i] + 1;
      k1 = (k1 + mix(v, 0x7feb352d)) >>> 0;
      k2 = (k2 + mix(v, 0x21f0aaad)) >>> 0;
      gParts += rem[i];
      gTotal += rem[i] * sizes[i];
    }
    const key = `${k1}:${k2}`;
    const bars = gTotal / cap;
    if (failed.has(key) || gTotal % cap !== 0 || gParts > maxSize * bars || gParts < minSize * bars || spent()) return false;
    const trailMark = trail.length;
    const chosenMark = chosen.length;
    const fail = (): boolean => {
      undo(trailMark, chosenMark);
      if (!aborted) failed.add(key);
      return false;
    };
    stamp++;
    const own: number[] = [];
    for (const i of g) {
      for (const t of setsOf[i]) {
        if (seen[t] !== stamp) {
          seen[t] = stamp;
          own.push(t);
        }
      }
    }
    const partsBefore = parts;
    for (let changed = true; changed; ) {
      changed = false;
      for (const id of own) {
        if (live[id] === 0) continue;
        const tm = trail.length;
        const cm = chosen.length;
        take(id);
        const ok = propagate();
        after[id] = trail.length - tm;
        undo(tm, cm);
        if (spent()) return fail();
        if (ok) continue;
        drop(id);
        if (!propagate()) return fail();
        changed = true;
      }
    }
    // Forced subsets may have split the group or finished it.
    if (parts < partsBefore) return solve(g) || fail();
    let pick = -1;
    let fewest = Infinity;
    for (const i of g) {
      if (rem[i] > 0 && count[i] < fewest) {
        fewest = count[i];
        pick = i;
      }
    }
    const options = Array.from(setsOf[pick]).filter((t) => live[t] === 1);
    options.sort((a, b) => after[a] - after[b]);
    for (const id of options) {
      const tm = trail.length;
      const cm = chosen.length;
      take(id);
      if (propagate() && solve(g)) return true;
      undo(tm, cm);
      if (aborted) break;
    }
    return fail();
  };

  for (let i = 0; i < n; i++) touched.push(i);
  if (!propagate() || !solve(Array.from({ length: n }, (_, i) => i))) return null;
  const bars: Int32Array[] = [];
  for (const id of chosen) {
    const bar = new Int32Array(n);
    items[id].forEach((i, a) => (bar[i] += needs[id][a]));
    bars.push(bar);
  }
  return bars;
}
