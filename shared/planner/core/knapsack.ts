// Bounded knapsack for pricing cutting patterns: maximise Σ v_i a_i subject to Σ w_i a_i ≤ cap, 0 ≤ a_i ≤ u_i integer.
// Two exact methods: a dynamic programme over the capacity when capacity × item pieces is small (it is immune to the
// near-equal value/weight ratios that column generation produces), otherwise depth-first branch and bound with the
// Dantzig bound, which never builds a table over the capacity (bar lengths in 0.01 mm stay cheap). Every answer carries
// a rigorous upper bound on the optimum, used by the lower-bound certificate.

export interface KnapsackResult {
  /** Best value found. */
  value: number;
  /** Counts of the best solution (dense, one per item). */
  counts: Int32Array;
  /** Proven upper bound on the optimum (equals value up to tolerance when `exact`). */
  upper: number;
  exact: boolean;
  /** Further improving solutions met on the way (value, counts), best last; may be empty. */
  others: { value: number; counts: Int32Array }[];
}

const DP_BUDGET = 300_000;
const PRUNE_EPS = 1e-10;

/** Work of one dynamic-programme pricing (cells), or Infinity when branch and bound would be used. */
export function knapsackWork(w: ArrayLike<number>, u: ArrayLike<number>, cap: number): number {
  let pieces = 0;
  for (let i = 0; i < w.length; i++) {
    const ub = Math.min(u[i], Math.floor(cap / w[i]));
    if (ub > 0) pieces += Math.ceil(Math.log2(ub + 1));
  }
  const cells = (cap + 1) * pieces;
  return cells <= DP_BUDGET ? cells : Infinity;
}

export function solveKnapsack(
  w: ArrayLike<number>,
  v: ArrayLike<number>,
  u: ArrayLike<number>,
  cap: number,
  nodeLimit = 200_000,
): KnapsackResult {
  const n = w.length;
  const idx: number[] = [];
  let pieces = 0;
  for (let i = 0; i < n; i++) {
    const ub = Math.min(u[i], Math.floor(cap / w[i]));
    if (ub > 0 && v[i] > 1e-12) {
      idx.push(i);
      pieces += Math.ceil(Math.log2(ub + 1));
    }
  }
  if (idx.length === 0) return { value: 0, counts: new Int32Array(n), upper: 0, exact: true, others: [] };
  if ((cap + 1) * pieces <= DP_BUDGET) return dp(w, v, u, cap, idx, pieces, n);
  return pareto(w, v, u, cap, idx, n) ?? branchAndBound(w, v, u, cap, idx, n, nodeLimit);
}

const PARETO_STATES = 3_000_000;

/**
 * Dynamic programme over item pieces that keeps only non-dominated (weight, value) states (Nemhauser & Ullmann,
 * "Discrete dynamic programming and capital allocation", Management Science 15 (1969) 494–505), pieces taken in
 * decreasing value/weight order so a state whose best completion cannot beat the incumbent is dropped. Its work
 * follows the number of useful partial patterns, not the capacity. Returns null past a work limit.
 */
function pareto(
  w: ArrayLike<number>,
  v: ArrayLike<number>,
  u: ArrayLike<number>,
  cap: number,
  idx: number[],
  n: number,
): KnapsackResult | null {
  const pw: number[] = [];
  const pv: number[] = [];
  const pItem: number[] = [];
  const pMult: number[] = [];
  for (const i of idx) {
    let left = Math.min(u[i], Math.floor(cap / w[i]));
    for (let mult = 1; left > 0; mult *= 2) {
      const k = Math.min(mult, left);
      left -= k;
      pw.push(w[i] * k);
      pv.push(v[i] * k);
      pItem.push(i);
      pMult.push(k);
    }
  }
  const order = pw.map((_, t) => t).sort((a, b) => pv[b] / pw[b] - pv[a] / pw[a]);
  const P = order.length;
  // Best efficiency among pieces from position t on (for the completion bound).
  const effFrom = new Float64Array(P + 1);
  for (let t = P - 1; t >= 0; t--) effFrom[t] = Math.max(effFrom[t + 1], pv[order[t]] / pw[order[t]]);
  // Trace of choices: node = (piece, previous node); a state points at its last node.
  let nodePiece = new Int32Array(1024);
  let nodePrev = new Int32Array(1024);
  let nodes = 0;
  const push = (piece: number, prev: number): number => {
    if (nodes === nodePiece.length) {
      const a = new Int32Array(nodes * 2);
      a.set(nodePiece);
      nodePiece = a;
      const b = new Int32Array(nodes * 2);
      b.set(nodePrev);
      nodePrev = b;
    }
    nodePiece[nodes] = piece;
    nodePrev[nodes] = prev;
    return nodes++;
  };
  // Two layers of states in typed buffers (weight, value, trace node), swapped after each piece.
  let W = new Float64Array(1024);
  let V = new Float64Array(1024);
  let N = new Int32Array(1024);
  let W2 = new Float64Array(1024);
  let V2 = new Float64Array(1024);
  let N2 = new Int32Array(1024);
  let L = 1;
  N[0] = -1;
  // A greedy fill in the same order gives an incumbent value, so the completion bound prunes from the first piece.
  let greedy = 0;
  const greedyCounts = new Int32Array(n);
  {
    let room = cap;
    for (const q of order) {
      if (pw[q] <= room) {
        room -= pw[q];
        greedy += pv[q];
        greedyCounts[pItem[q]] += pMult[q];
      }
    }
  }
  let best = 0;
  let bestNode = -1;
  let work = 0;
  for (let t = 0; t < P; t++) {
    const q = order[t];
    const aw = pw[q];
    const av = pv[q];
    const eff = effFrom[t + 1];
    if (W2.length < 2 * L) {
      // The next layer holds at most every state with and without this piece.
      W2 = new Float64Array(4 * L);
      V2 = new Float64Array(4 * L);
      N2 = new Int32Array(4 * L);
    }
    let L2 = 0;
    let a = 0;
    let b = 0;
    while (a < L || b < L) {
      const bw = b < L ? W[b] + aw : Infinity;
      if (b < L && bw > cap) b = L; // the layer is sorted by weight: no later state fits either
      if (a >= L && b >= L) break;
      const useA = a < L && (b >= L || W[a] <= W[b] + aw);
      let ww: number;
      let vv: number;
      let nn: number;
      if (useA) {
        ww = W[a];
        vv = V[a];
        nn = N[a];
        a++;
      } else {
        ww = W[b] + aw;
        vv = V[b] + av;
        nn = -2 - b; // trace node made only if the state is kept or is the best
        b++;
      }
      // Dominated by the last kept state, or unable to beat the best even when filled at the best rate left.
      const isBest = nn <= -2 && vv > best;
      if (!isBest) {
        if (L2 > 0 && vv <= V2[L2 - 1] + 1e-12) continue;
        const floor = Math.max(best, greedy);
        if (vv + (cap - ww) * eff <= floor + 1e-10 && vv < floor) continue;
      }
      if (nn <= -2) nn = push(q, N[-2 - nn]);
      if (isBest) {
        best = vv;
        bestNode = nn;
        if (L2 > 0 && vv <= V2[L2 - 1] + 1e-12) continue;
      }
      W2[L2] = ww;
      V2[L2] = vv;
      N2[L2] = nn;
      L2++;
    }
    [W, W2] = [W2, W];
    [V, V2] = [V2, V];
    [N, N2] = [N2, N];
    L = L2;
    work += L;
    if (work > PARETO_STATES) return null;
  }
  const trace = (last: number): Int32Array => {
    const c = new Int32Array(n);
    for (let node = last; node >= 0; node = nodePrev[node]) c[pItem[nodePiece[node]]] += pMult[nodePiece[node]];
    return c;
  };
  // The surviving states are feasible patterns too: the next best few are cheap extra columns.
  const others = Array.from(N.subarray(0, L), (node, k) => ({ node, value: V[k] }))
    .filter((x) => x.node !== bestNode && x.node >= 0)
    .sort((a, b) => b.value - a.value)
    .slice(0, 6)
    .map((x) => ({ value: x.value, counts: trace(x.node) }));
  if (greedy > best) return { value: greedy, counts: greedyCounts, upper: greedy + 1e-9 * Math.max(1, greedy), exact: true, others };
  return { value: best, counts: trace(bestNode), upper: best + 1e-9 * Math.max(1, best), exact: true, others };
}

function dp(
  w: ArrayLike<number>,
  v: ArrayLike<number>,
  u: ArrayLike<number>,
  cap: number,
  idx: number[],
  pieces: number,
  n: number,
): KnapsackResult {
  const best = new Float64Array(cap + 1);
  const take = new Uint8Array(pieces * (cap + 1));
  const pItem = new Int32Array(pieces);
  const pMult = new Int32Array(pieces);
  let p = 0;
  for (const i of idx) {
    let left = Math.min(u[i], Math.floor(cap / w[i]));
    for (let mult = 1; left > 0; mult *= 2) {
      const k = Math.min(mult, left);
      left -= k;
      pItem[p] = i;
      pMult[p] = k;
      const pw = w[i] * k;
      const pv = v[i] * k;
      const off = p * (cap + 1);
      for (let c = cap; c >= pw; c--) {
        const cand = best[c - pw] + pv;
        if (cand > best[c]) {
          best[c] = cand;
          take[off + c] = 1;
        }
      }
      p++;
    }
  }
  const counts = new Int32Array(n);
  let c = cap;
  for (let q = p - 1; q >= 0; q--) {
    if (take[q * (cap + 1) + c]) {
      counts[pItem[q]] += pMult[q];
      c -= w[pItem[q]] * pMult[q];
    }
  }
  const value = best[cap];
  return { value, counts, upper: value + 1e-9 * Math.max(1, value), exact: true, others: [] };
}

function branchAndBound(
  w: ArrayLike<number>,
  v: ArrayLike<number>,
  u: ArrayLike<number>,
  cap: number,
  idx: number[],
  n: number,
  nodeLimit: number,
): KnapsackResult {
  idx.sort((a, b) => v[b] / w[b] - v[a] / w[a] || w[b] - w[a]);
  const k = idx.length;
  const iw = new Float64Array(k);
  const iv = new Float64Array(k);
  const iu = new Int32Array(k);
  for (let t = 0; t < k; t++) {
    const i = idx[t];
    iw[t] = w[i];
    iv[t] = v[i];
    iu[t] = Math.min(u[i], Math.floor(cap / w[i]));
  }
  // Prefix sums over the full multiplicities give the Dantzig bound of any suffix in O(log k).
  const W = new Float64Array(k + 1);
  const V = new Float64Array(k + 1);
  for (let t = 0; t < k; t++) {
    W[t + 1] = W[t] + iw[t] * iu[t];
    V[t + 1] = V[t] + iv[t] * iu[t];
  }
  const minW = new Float64Array(k + 1).fill(Infinity);
  for (let t = k - 1; t >= 0; t--) minW[t] = Math.min(minW[t + 1], iw[t]);

  const bound = (t: number, room: number): number => {
    // Largest s ≥ t with W[s] − W[t] ≤ room.
    const target = W[t] + room;
    let lo = t;
    let hi = k;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (W[mid] <= target + 1e-9) lo = mid;
      else hi = mid - 1;
    }
    let b = V[lo] - V[t];
    if (lo < k) b += ((target - W[lo]) * iv[lo]) / iw[lo];
    return b;
  };

  const rootUpper = bound(0, cap);
  const cur = new Int32Array(k);
  const bestCounts = new Int32Array(k);
  let bestValue = 0;
  // Greedy start so pruning bites at once.
  {
    let room = cap;
    let val = 0;
    for (let t = 0; t < k; t++) {
      const a = Math.min(iu[t], Math.floor(room / iw[t]));
      bestCounts[t] = a;
      room -= a * iw[t];
      val += a * iv[t];
    }
    bestValue = val;
  }
  const others: { value: number; counts: Int32Array }[] = [];
  let nodes = 0;
  let aborted = false;

  const rec = (t: number, room: number, val: number): void => {
    if (aborted) return;
    if (++nodes > nodeLimit) {
      aborted = true;
      return;
    }
    if (t === k || room < minW[t]) {
      if (val > bestValue + PRUNE_EPS) {
        bestValue = val;
        bestCounts.set(cur);
        for (let s = t; s < k; s++) bestCounts[s] = 0;
        if (others.length < 8) others.push({ value: val, counts: expand(cur, t) });
      }
      return;
    }
    if (val + bound(t, room) <= bestValue + PRUNE_EPS) return;
    const maxA = Math.min(iu[t], Math.floor(room / iw[t]));
    for (let a = maxA; a >= 0; a--) {
      cur[t] = a;
      rec(t + 1, room - a * iw[t], val + a * iv[t]);
      if (aborted) break;
    }
    cur[t] = 0;
  };
  const expand = (c: Int32Array, upto: number): Int32Array => {
    const out = new Int32Array(n);
    for (let s = 0; s < upto; s++) out[idx[s]] = c[s];
    return out;
  };
  rec(0, cap, 0);
  const counts = expand(bestCounts, k);
  const exact = !aborted;
  const upper = exact ? bestValue + PRUNE_EPS + 1e-9 * Math.max(1, bestValue) : Math.max(rootUpper, bestValue);
  const worse = others.filter((o) => o.value < bestValue - PRUNE_EPS);
  return { value: bestValue, counts, upper, exact, others: worse };
}
