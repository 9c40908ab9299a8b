import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { emptyLast } from '@shared/sheets/empty-last';
import { nest, smallestSide, type NestItem, type SheetKind } from '@shared/sheets/guillotine';
import { checkSheetPlan, plannedSheet, planSheets, validateSheetJob, type SheetJob, type SheetPlan } from '@shared/sheets/index';
import { CLASSES, generate } from '../../../scripts/bench-sheets/classes';

const byArea = (p: NestItem, q: NestItem) => q.l * q.w - p.l * p.w;
const RULES = { orders: [byArea], fits: ['area' as const], splits: ['short-leftover' as const, 'min-area' as const] };

/** The job's parts nested in one plain pass, then emptied; returned as a plan the independent checker can replay. */
function emptied(job: SheetJob): { before: number; plan: SheetPlan } {
  const v = validateSheetJob(job);
  const items: NestItem[] = [];
  const labels: string[] = [];
  const sizes: { length: number; width: number }[] = [];
  for (const p of v.parts) for (let q = 0; q < p.qty; q++) {
    items.push({ id: items.length, l: p.length, w: p.width, rotatable: !p.grain });
    labels.push(p.label);
    sizes.push({ length: p.length, width: p.width });
  }
  const kinds: SheetKind[] = v.sheets.map((s, i) => ({ index: i, L: s.length - 2 * v.trim, W: s.width - 2 * v.trim, ox: v.trim, oy: v.trim, qty: s.qty ?? null, price: s.price ?? 0 }));
  const first = nest([...items].sort(byArea), kinds, v.kerf, { fit: 'area', split: 'short-leftover' });
  if (!first) throw new Error('expected a first plan');
  const out = emptyLast(first, items, v.kerf, smallestSide(items), RULES, { left: 1e6, n: items.length, over: () => false });
  const sheets = out.map((s) => plannedSheet(s, v.sheets[s.kind.index], v.kerf, v.trim, labels, sizes));
  return { before: first.length, plan: { sheetCount: sheets.length, lowerBound: 0, areaBound: 0, waste_pct: 0, cost: 0, sheets, stats: { passes: 0, elapsedMs: 0, stopped: 'passes' } } };
}

const jobArb = fc.record({
  kerf: fc.constantFrom(0, 3),
  trim: fc.constantFrom(0, 10),
  sheets: fc.constant([{ length: 1200, width: 800 }] as { length: number; width: number }[]),
  parts: fc.array(fc.record({ length: fc.integer({ min: 30, max: 700 }), width: fc.integer({ min: 30, max: 500 }), qty: fc.integer({ min: 1, max: 3 }), label: fc.constantFrom('A', 'B', 'C'), grain: fc.boolean() }), { minLength: 3, maxLength: 12 }),
});

describe('the emptying move', () => {
  it('keeps every sheet cuttable as printed and never adds a sheet (fast-check, checked by checkSheetPlan)', () => {
    fc.assert(
      fc.property(jobArb, (job) => {
        const { before, plan } = emptied(job);
        expect(checkSheetPlan(validateSheetJob(job), plan)).toEqual([]);
        expect(plan.sheetCount).toBeLessThanOrEqual(before);
      }),
      { numRuns: 80, seed: 16 },
    );
  }, 60_000);
  it('takes sheets off one plain pass on the benchmark’s generated classes (Berkey–Wang, Martello–Vigo rules; seeds 1, 11)', () => {
    let before = 0;
    let after = 0;
    for (const cls of CLASSES) {
      for (const seed of [1, 11]) {
        const ins = generate(cls, 40, seed);
        const r = emptied({ kerf: 0, trim: 0, sheets: [{ length: ins.bin.L, width: ins.bin.W }], parts: ins.items.map((it, i) => ({ length: it.l, width: it.w, qty: 1, label: `p${i}` })) });
        before += r.before;
        after += r.plan.sheetCount;
      }
    }
    expect(after).toBeLessThan(before);
  });
});

describe('the plan depends on the job, not on the machine', () => {
  // Class V, n = 40, seed 11: no plan found meets its lower bound, so the whole budget is spent.
  const ins = generate('V', 40, 11);
  const job: SheetJob = { kerf: 0, trim: 0, sheets: [{ length: ins.bin.L, width: ins.bin.W }], parts: ins.items.map((it, i) => ({ length: it.l, width: it.w, qty: 1, label: `p${i}` })) };
  const strip = (p: SheetPlan) => ({ ...p, stats: { ...p.stats, elapsedMs: 0 } });
  it('a frozen clock and one that runs 10 ms a reading (slow machine) give the same plan within the budget', () => {
    let t = 0;
    const slow = planSheets(job, { maxPasses: 300, timeLimitMs: 1e12, now: () => (t += 10) });
    const fast = planSheets(job, { maxPasses: 300, timeLimitMs: 1e12, now: () => 0 });
    expect(strip(slow)).toEqual(strip(fast));
    expect(fast.stats.stopped).toBe('passes');
  });
  it('the time limit is a safety stop: a clock past it ends the search, says so, and still gives a full plan', () => {
    let t = 0;
    const cut = planSheets(job, { maxPasses: 3000, timeLimitMs: 50, now: () => (t += 1000) });
    expect(cut.stats.stopped).toBe('time');
    expect(checkSheetPlan(validateSheetJob(job), cut)).toEqual([]);
  });
});
