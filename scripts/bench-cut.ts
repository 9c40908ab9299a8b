// `npm run bench:cut [-- --quick] [--random [--covers] [--seeds A-B]] [--priced] [--no-mip] [--time-limit MS] [--set NAME ...] [--clock cpu|wall] [--out FILE.tsv]`
// Runs the stock planner on the classic one-dimensional bin-packing benchmark in ../shared/bench/bpp (read in place;
// its licence forbids copies; BPP_DIR points elsewhere) and prints, per set: instances at the known optimum, gaps,
// times, and the same for plain first fit decreasing. `--random` adds generated split lists (optimum known by
// construction; `--covers` also counts, by complete enumeration within a node budget, how many ways each three-part
// list can be cut back into whole bars; `--seeds A-B` runs those seeds instead of the tuned and held-out ones) and
// `--priced` small priced jobs checked against the exact model on HiGHS; with either alone the classic sets are
// skipped unless `--quick` or `--set` asks for them. Sequential on purpose: the machine is shared.
import { writeFileSync } from 'node:fs';
import highsLoader from 'highs';
import { useMipSolver, type MipSolver } from '../shared/planner/index';
import { runPriced, runSplit } from './bench-cut/generated-run';
import { benchAvailable, benchDir, loadInstances } from './bench-cut/instances';
import { runInstance, type InstanceResult } from './bench-cut/run-instance';
import { summarise, formatSummary } from './bench-cut/summary';

function parseArgs(argv: string[]) {
  const out = { quick: false, random: false, covers: false, seeds: null as number[] | null, priced: false, mip: true, timeLimitMs: NaN, sets: [] as string[], file: '', clock: 'cpu' as 'cpu' | 'wall' };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--quick') out.quick = true;
    else if (a === '--random') out.random = true;
    else if (a === '--covers') out.covers = true;
    else if (a === '--seeds') {
      const m = /^(\d+)-(\d+)$/.exec(argv[++i] ?? '');
      if (!m || Number(m[2]) < Number(m[1]) || Number(m[2]) - Number(m[1]) >= 1000) throw new Error('--seeds: A-B, at most 1,000 seeds');
      out.seeds = Array.from({ length: Number(m[2]) - Number(m[1]) + 1 }, (_, k) => Number(m[1]) + k);
    }
    else if (a === '--priced') out.priced = true;
    else if (a === '--no-mip') out.mip = false;
    else if (a === '--time-limit') out.timeLimitMs = Number(argv[++i]);
    else if (a === '--set') out.sets.push(argv[++i]);
    else if (a === '--out') out.file = argv[++i];
    else if (a === '--clock') {
      const c = argv[++i];
      if (c !== 'cpu' && c !== 'wall') throw new Error('--clock: cpu or wall');
      out.clock = c;
    }
    else throw new Error(`unknown argument ${a}`);
  }
  // The quick subset runs at the product's default limit so it stays under two minutes; the full run allows 6 s, which
  // keeps the wall time of an instance under 10 s even when the machine is busy with other work.
  if (Number.isNaN(out.timeLimitMs)) out.timeLimitMs = out.quick || out.random || out.priced ? 2000 : 6000;
  return out;
}

const args = parseArgs(process.argv.slice(2));
// The product's planners get HiGHS for the exact model on small jobs with several stock types; so does the benchmark.
const highs = await highsLoader();
if (args.mip) useMipSolver(highs.solve as unknown as MipSolver);
let generatedOk = true;
if (args.random) {
  console.log(`split lists, time limit ${args.timeLimitMs} ms each, CPU clock`);
  generatedOk &&= runSplit(args.timeLimitMs, args.covers, args.seeds ?? undefined);
}
if (args.priced) {
  console.log(`priced jobs, time limit ${args.timeLimitMs} ms each, CPU clock; exact model on HiGHS`);
  generatedOk &&= runPriced(highs, args.timeLimitMs);
}
if ((args.random || args.priced) && !args.quick && args.sets.length === 0) process.exit(generatedOk ? 0 : 1);
if (!benchAvailable()) {
  console.error(`bench:cut: the benchmark instances are not present at ${benchDir}`);
  process.exit(1);
}
const instances = loadInstances({ quick: args.quick, sets: args.sets.length ? args.sets : undefined });
console.log(`${instances.length} instances, time limit ${args.timeLimitMs} ms each, ${args.clock} clock (times below on that clock)`);
const results: InstanceResult[] = [];
const t0 = performance.now();
for (const ins of instances) {
  const r = runInstance(ins, args.timeLimitMs, args.clock);
  results.push(r);
  if (!r.feasible || r.lowerBound > r.optimum || r.bars !== r.optimum) {
    const why = !r.feasible ? 'INFEASIBLE PLAN' : r.lowerBound > r.optimum ? 'INVALID BOUND' : 'above optimum';
    console.log(`  ${r.name}: ${why} (bars ${r.bars}, optimum ${r.optimum}, bound ${r.lowerBound}, ${r.ms.toFixed(0)} ms)`);
  }
}
console.log(formatSummary(summarise(results)));
const wall = results.map((r) => r.wallMs).sort((a, b) => a - b);
console.log(
  `wall time: total ${((performance.now() - t0) / 1000).toFixed(1)} s, per instance median ${wall[wall.length >> 1].toFixed(0)} ms, max ${wall[wall.length - 1].toFixed(0)} ms`,
);
if (args.file) {
  const head = 'instance\tset\topt\tbars\tlower_bound\toptimal\tms\twall_ms\tffd\tffd_ms\tfeasible';
  const rows = results.map((r) =>
    [r.name, r.set, r.optimum, r.bars, r.lowerBound, r.optimal, r.ms.toFixed(1), r.wallMs.toFixed(1), r.ffdBars, r.ffdMs.toFixed(2), r.feasible].join('\t'),
  );
  writeFileSync(args.file, [head, ...rows].join('\n') + '\n');
}
const bad = results.filter((r) => !r.feasible || r.lowerBound > r.optimum);
process.exit(bad.length ? 1 : 0);
