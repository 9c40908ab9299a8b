// The exact reference for priced jobs: every maximal bar layout as an integer variable, solved by HiGHS (the `highs`
// package) for least cost and, at that cost, fewest bars, in one objective (cost × (pieces + 1) + bars; whole prices,
// so no bar count outweighs one unit of cost). Written apart from the planner's own model so that the two do not
// share a mistake. Whole-millimetre jobs only (the generated ones are).
import type { Highs } from 'highs';
import type { CutJob } from '../../shared/planner/index';

export interface Reference {
  cost: number;
  bars: number;
  /** HiGHS proved it optimal within its time limit. */
  proven: boolean;
  ms: number;
}

export function reference(highs: Highs, job: CutJob, timeLimitS = 60): Reference {
  const kerf = job.kerf ?? 3;
  const trim = job.trim ?? 0;
  const sizeOf = new Map<number, number>();
  for (const p of job.parts) sizeOf.set(p.length + kerf, (sizeOf.get(p.length + kerf) ?? 0) + p.qty);
  const sizes = [...sizeOf.keys()].sort((a, b) => b - a);
  const demand = sizes.map((s) => sizeOf.get(s)!);
  const pieces = demand.reduce((a, b) => a + b, 0);
  const cols: { type: number; counts: number[] }[] = [];
  job.stock.forEach((st, t) => {
    if (st.qty === 0) return;
    const cap = st.length - trim + kerf;
    const counts = sizes.map(() => 0);
    const rec = (i: number, room: number): void => {
      if (i === sizes.length) {
        // Maximal: no demanded size still fits.
        if (counts.some((c) => c > 0) && sizes.every((s, k) => counts[k] >= demand[k] || s > room)) cols.push({ type: t, counts: counts.slice() });
        return;
      }
      for (let c = Math.min(demand[i], Math.floor(room / sizes[i])); c >= 0; c--) {
        counts[i] = c;
        rec(i + 1, room - c * sizes[i]);
      }
      counts[i] = 0;
    };
    rec(0, cap);
  });
  const w = pieces + 1;
  const x = (j: number): string => `x${j}`;
  const obj = cols.map((c, j) => `+ ${Math.round((job.stock[c.type].price ?? 0) * w) + 1} ${x(j)}`);
  const rows = sizes.map((_, i) => ` r${i}: ${cols.map((c, j) => (c.counts[i] ? `+ ${c.counts[i]} ${x(j)}` : '')).filter(Boolean).join(' ')} >= ${demand[i]}`);
  job.stock.forEach((st, t) => {
    if (st.qty == null || st.qty === 0) return;
    const use = cols.map((c, j) => (c.type === t ? `+ ${x(j)}` : '')).filter(Boolean);
    if (use.length) rows.push(` s${t}: ${use.join(' ')} <= ${st.qty}`);
  });
  const model = ['Minimize', ` z: ${obj.join(' ')}`, 'Subject To', ...rows, 'General', ` ${cols.map((_, j) => x(j)).join(' ')}`, 'End'].join('\n');
  const t0 = performance.now();
  const r = highs.solve(model, { output_flag: false, time_limit: timeLimitS, mip_rel_gap: 0 });
  const ms = performance.now() - t0;
  let cost = 0;
  let bars = 0;
  cols.forEach((c, j) => {
    const col = r.Columns[x(j)] as { Primal?: number } | undefined;
    const v = Math.round(col?.Primal ?? 0);
    cost += v * (job.stock[c.type].price ?? 0);
    bars += v;
  });
  return { cost, bars, proven: r.Status === 'Optimal', ms };
}
