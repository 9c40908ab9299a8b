import { packIntoBars } from './shared/planner/core/bin-completion';
import { splitList, HELD_OUT_SPLIT, TUNED_SPLIT } from './scripts/bench-cut/generated';
for (const fam of ['split', 'triplets'] as const) for (const seed of [...TUNED_SPLIT, ...HELD_OUT_SPLIT]) {
  const l = splitList(seed, fam);
  const parts = l.job.parts;
  const sizes = parts.map((p) => p.length), demand = parts.map((p) => p.qty);
  const t = performance.now();
  const r = packIntoBars(sizes, demand, 6000, l.bars, 2_000_000);
  console.log(fam, seed, l.bars, demand.reduce((a, b) => a + b), r ? 'found' : 'no', (performance.now() - t).toFixed(0));
}
