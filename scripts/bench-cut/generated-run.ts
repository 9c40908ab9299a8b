// Runs the generated jobs (./generated) through the public planner and prints hits, gaps and times per seed group.
import type { Highs } from 'highs';
import { planCutsSync } from '../../shared/planner/index';
import {
  BAR_MM,
  HELD_OUT_PRICED,
  HELD_OUT_SPLIT,
  TUNED_PRICED,
  TUNED_SPLIT,
  pricedJob,
  splitList,
} from './generated';
import { countCovers } from './count-covers';
import { reference } from './reference';
import { cpuClock } from './run-instance';

interface Row {
  name: string;
  hit: boolean;
  gap: number;
  ms: number;
  optimal: boolean;
  note: string;
}

const q = (xs: number[], f: number): number => {
  const s = xs.slice().sort((a, b) => a - b);
  return s.length ? s[Math.min(s.length - 1, Math.floor(f * s.length))] : NaN;
};

function report(title: string, rows: Row[]): void {
  const ms = rows.map((r) => r.ms);
  const gaps = rows.map((r) => r.gap);
  console.log(
    `${title.padEnd(34)} ${String(rows.filter((r) => r.hit).length).padStart(3)}/${rows.length} at the optimum, ` +
      `${rows.filter((r) => r.optimal).length} proven; mean gap ${(100 * gaps.reduce((a, b) => a + b, 0) / Math.max(1, rows.length)).toFixed(2)} %, ` +
      `max ${(100 * Math.max(0, ...gaps)).toFixed(2)} %; ms median ${q(ms, 0.5).toFixed(0)}, p95 ${q(ms, 0.95).toFixed(0)}, max ${Math.max(...ms).toFixed(0)}`,
  );
  for (const r of rows.filter((x) => !x.hit)) console.log(`    ${r.name}: ${r.note}`);
}

/** Node budget of the cover count per list (about 2.5 s per 100,000 nodes on this machine). */
const COUNT_NODES = 100_000;

/** Hits by list size, in tens of bars: where a family stops reaching the optimum. */
function bySize(rows: Row[], bars: number[]): string {
  const bands = new Map<number, [number, number]>();
  rows.forEach((r, i) => {
    const b = Math.min(90, Math.floor(bars[i] / 10) * 10);
    const [hit, all] = bands.get(b) ?? [0, 0];
    bands.set(b, [hit + (r.hit ? 1 : 0), all + 1]);
  });
  return [...bands].sort((a, b) => a[0] - b[0]).map(([b, [hit, all]]) => `${b}–${b === 90 ? 100 : b + 9} bars ${hit}/${all}`).join(', ');
}

/**
 * Split and triplet lists of the tuned and held-out seeds, or of `seeds` alone (a range of the caller's, for a look
 * beyond both); false when any list ends above its optimum.
 */
export function runSplit(timeLimitMs: number, covers = false, seeds?: number[]): boolean {
  let all = true;
  const groups: (readonly [string, readonly number[]])[] = seeds
    ? [['given', seeds]]
    : [
        ['tuned', TUNED_SPLIT],
        ['held out', HELD_OUT_SPLIT],
      ];
  for (const family of ['split', 'triplets'] as const) {
    for (const [group, seeds] of groups) {
      const rows: Row[] = [];
      const bars: number[] = [];
      for (const seed of seeds) {
        const l = splitList(seed, family);
        const t0 = cpuClock();
        const plan = planCutsSync(l.job, { timeLimitMs, clock: cpuClock });
        const ms = cpuClock() - t0;
        const hit = plan.barCount === l.bars;
        all &&= hit;
        bars.push(l.bars);
        rows.push({ name: l.name, hit, gap: (plan.barCount - l.bars) / l.bars, ms, optimal: plan.optimal, note: `${plan.barCount} bars, optimum ${l.bars} (seed ${seed}), ${ms.toFixed(0)} ms` });
      }
      report(`${family} (${group}, seeds ${seeds[0]}–${seeds[seeds.length - 1]})`, rows);
      console.log(`    by size: ${bySize(rows, bars)}`);
      if (covers && family === 'triplets') printCoverCounts(seeds);
    }
  }
  return all;
}

function printCoverCounts(seeds: readonly number[]): void {
  for (const seed of seeds) {
    const l = splitList(seed, 'triplets');
    const c = countCovers(l.job.parts.map((p) => p.length), l.job.parts.map((p) => p.qty), BAR_MM, COUNT_NODES);
    const found = c.complete ? `${c.covers} exact cover${c.covers === 1 ? '' : 's'}` : `at least ${c.covers} exact covers (budget spent)`;
    console.log(`    ${l.name}: ${l.bars} bars, ${c.subsets} three-part fills, ${found}, ${c.nodes} search nodes`);
  }
}

export function runPriced(highs: Highs, timeLimitMs: number): boolean {
  let all = true;
  for (const [group, seeds] of [
    ['tuned', TUNED_PRICED],
    ['held out', HELD_OUT_PRICED],
  ] as const) {
    const rows: Row[] = [];
    let barsOver = 0;
    let refMs = 0;
    for (const seed of seeds) {
      const j = pricedJob(seed);
      const ref = reference(highs, j.job);
      refMs += ref.ms;
      const t0 = cpuClock();
      const plan = planCutsSync(j.job, { timeLimitMs, clock: cpuClock });
      const ms = cpuClock() - t0;
      const hit = plan.cost <= ref.cost + 1e-6;
      if (hit && plan.barCount > ref.bars) barsOver++;
      all &&= hit && ref.proven;
      const pieces = j.job.parts.reduce((s, p) => s + p.qty, 0);
      rows.push({
        name: j.name,
        hit,
        gap: ref.cost > 0 ? (plan.cost - ref.cost) / ref.cost : plan.cost > 0 ? 1 : 0,
        ms,
        optimal: plan.optimal,
        note: `cost ${plan.cost} (${plan.barCount} bars), exact ${ref.cost} (${ref.bars} bars${ref.proven ? '' : ', unproven'}), ${pieces} pieces, ${ms.toFixed(0)} ms`,
      });
      if (hit && plan.barCount !== ref.bars) rows[rows.length - 1].note += ' — bars differ';
    }
    report(`priced (${group}, seeds ${seeds[0]}–${seeds[seeds.length - 1]})`, rows);
    console.log(`    at the least cost with more bars than the exact model: ${barsOver}; exact model ${(refMs / 1000).toFixed(1)} s in all`);
  }
  return all;
}
