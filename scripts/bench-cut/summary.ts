import type { InstanceResult } from './run-instance';

export interface SetSummary {
  set: string;
  count: number;
  atOptimum: number;
  provenOptimal: number;
  meanGapPct: number;
  meanBoundGapPct: number;
  time: { median: number; p95: number; max: number };
  ffd: { atOptimum: number; meanGapPct: number; time: { median: number; p95: number; max: number } };
  boundValid: boolean;
  feasible: boolean;
}

function quantiles(xs: number[]) {
  const s = xs.slice().sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.max(0, Math.ceil(q * s.length) - 1))];
  return { median: at(0.5), p95: at(0.95), max: s[s.length - 1] };
}

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / Math.max(1, xs.length);

function summariseGroup(set: string, rs: InstanceResult[]): SetSummary {
  return {
    set,
    count: rs.length,
    atOptimum: rs.filter((r) => r.bars === r.optimum).length,
    provenOptimal: rs.filter((r) => r.optimal).length,
    meanGapPct: mean(rs.map((r) => ((r.bars - r.optimum) / r.optimum) * 100)),
    meanBoundGapPct: mean(rs.map((r) => ((r.bars - r.lowerBound) / r.lowerBound) * 100)),
    time: quantiles(rs.map((r) => r.ms)),
    ffd: {
      atOptimum: rs.filter((r) => r.ffdBars === r.optimum).length,
      meanGapPct: mean(rs.map((r) => ((r.ffdBars - r.optimum) / r.optimum) * 100)),
      time: quantiles(rs.map((r) => r.ffdMs)),
    },
    boundValid: rs.every((r) => r.lowerBound <= r.optimum),
    feasible: rs.every((r) => r.feasible),
  };
}

export function summarise(results: InstanceResult[]): SetSummary[] {
  const sets = [...new Set(results.map((r) => r.set))];
  const out = sets.map((s) => summariseGroup(s, results.filter((r) => r.set === s)));
  const outside = results.filter((r) => r.set !== 'Hard28');
  if (sets.length > 1) {
    if (outside.length && outside.length !== results.length) out.push(summariseGroup('all but Hard28', outside));
    out.push(summariseGroup('all', results));
  }
  return out;
}

export function formatSummary(rows: SetSummary[]): string {
  const ms = (v: number) => (v >= 100 ? v.toFixed(0) : v.toFixed(1));
  const head = ['set', 'n', 'at opt', 'proven', 'gap %', 'bound gap %', 'median ms', 'p95 ms', 'max ms', '| FFD at opt', 'FFD gap %', 'FFD median ms', 'FFD max ms', 'bound ok'];
  const lines = rows.map((r) => [
    r.set,
    String(r.count),
    String(r.atOptimum),
    String(r.provenOptimal),
    r.meanGapPct.toFixed(3),
    r.meanBoundGapPct.toFixed(3),
    ms(r.time.median),
    ms(r.time.p95),
    ms(r.time.max),
    '| ' + String(r.ffd.atOptimum),
    r.ffd.meanGapPct.toFixed(3),
    ms(r.ffd.time.median),
    ms(r.ffd.time.max),
    r.boundValid && r.feasible ? 'yes' : 'NO',
  ]);
  const all = [head, ...lines];
  const widths = head.map((_, c) => Math.max(...all.map((l) => l[c].length)));
  return all.map((l) => l.map((x, c) => (c === 0 ? x.padEnd(widths[c]) : x.padStart(widths[c]))).join('  ')).join('\n');
}
