import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkSheetPlan, planSheets, sheetLowerBound, validateSheetJob, type SheetJob } from '@shared/sheets/index';
import { errorOf } from '../../support/input-error';
import { bruteForceSheets } from './brute-force';

// Sheet sizes and kerf are common practice (REFERENCES.md "Sheet goods": 2440 × 1220 mm, track-saw kerf ≈ 2.2–3.2 mm).

describe('hand-worked plans', () => {
  it('eight 1200 × 600 parts that may turn: four across a 2420 × 1200 trimmed sheet (4·600 + 3·3 = 2409) → 2 sheets', () => {
    const plan = planSheets({ kerf: 3, trim: 10, sheets: [{ length: 2440, width: 1220 }], parts: [{ length: 1200, width: 600, qty: 8, label: 'P' }] });
    expect(plan.sheetCount).toBe(2);
    expect(plan.lowerBound).toBe(2);
  });
  it('the same parts with the grain: two along (2·1200 + 3 ≤ 2420), one across (2·600 + 3 > 1200) → 4 sheets, and the bound proves it', () => {
    const job: SheetJob = { kerf: 3, trim: 10, sheets: [{ length: 2440, width: 1220 }], parts: [{ length: 1200, width: 600, qty: 8, label: 'P', grain: true }] };
    const plan = planSheets(job);
    expect(plan.sheetCount).toBe(4);
    // Area alone says 2; the long-part bound (each part wider than half the trimmed width, so they stack across it
    // one at a time: 8 · 1203 / 2423 → 4) certifies 4.
    expect(plan.areaBound).toBe(2);
    expect(plan.lowerBound).toBe(4);
    expect(plan.sheets.every((s) => s.placements.every((p) => !p.rotated))).toBe(true);
  });
  it('waste % is the sheets’ area not in parts: one 1000 × 500 part on one 2440 × 1220 sheet', () => {
    const plan = planSheets({ kerf: 3, trim: 0, sheets: [{ length: 2440, width: 1220 }], parts: [{ length: 1000, width: 500, qty: 1, label: 'A' }] });
    expect(plan.waste_pct).toBeCloseTo((1 - 500_000 / (2440 * 1220)) * 100, 9);
  });
  it('an offcut on hand is used before a bought sheet, and prices add up', () => {
    const plan = planSheets({ kerf: 3, trim: 0, sheets: [{ length: 2440, width: 1220, price: 60 }, { length: 900, width: 600, qty: 1, price: 0 }], parts: [{ length: 800, width: 500, qty: 2, label: 'A' }] });
    expect(plan.sheets.map((s) => s.length)).toEqual([900, 2440]);
    expect(plan.cost).toBe(60);
  });
  it('a part larger than every sheet is refused, naming the part', () => {
    const e = errorOf(() => planSheets({ kerf: 3, trim: 10, sheets: [{ length: 2440, width: 1220 }], parts: [{ length: 2500, width: 300, qty: 1, label: 'Long', grain: true }] }));
    expect(e.field).toBe('parts[0]');
    expect(e.message).toContain("'Long'");
  });
  it('bounds: a kerf of 50 mm is refused, naming the kerf', () => {
    expect(errorOf(() => planSheets({ kerf: 50, sheets: [{ length: 2440, width: 1220 }], parts: [{ length: 100, width: 100, qty: 1, label: 'A' }] })).field).toBe('kerf');
  });
});

describe('the checker catches plans that cannot be cut (so the property below can fail)', () => {
  const job: SheetJob = { kerf: 3, trim: 10, sheets: [{ length: 2440, width: 1220 }], parts: [{ length: 700, width: 400, qty: 3, label: 'A', grain: true }] };
  const valid = validateSheetJob(job);
  it('a part moved into its neighbour’s kerf', () => {
    const plan = planSheets(job);
    const moved = structuredClone(plan);
    const [a, b] = moved.sheets[0].placements;
    b.x = a.x;
    b.y = a.y + 1;
    expect(checkSheetPlan(valid, moved).length).toBeGreaterThan(0);
  });
  it('a cut that stops short of the piece’s edge', () => {
    const plan = planSheets(job);
    const bad = structuredClone(plan);
    const c = bad.sheets[0].cuts.find((x) => x.kind === 'cut');
    if (!c) throw new Error('expected a cut');
    if (c.x1 === c.x2) c.y2 -= 10;
    else c.x2 -= 10;
    expect(checkSheetPlan(valid, bad).length).toBeGreaterThan(0);
  });
  it('a grain part turned', () => {
    const plan = planSheets(job);
    const bad = structuredClone(plan);
    bad.sheets[0].placements[0].rotated = true;
    expect(checkSheetPlan(valid, bad).some((p) => p.includes('grain'))).toBe(true);
  });
});

const partArb = fc.record({
  length: fc.integer({ min: 20, max: 1400 }),
  width: fc.integer({ min: 20, max: 800 }),
  qty: fc.integer({ min: 1, max: 4 }),
  label: fc.string({ minLength: 1, maxLength: 4 }),
  grain: fc.boolean(),
});
const jobArb = fc.record({
  kerf: fc.constantFrom(0, 2.2, 3, 3.2),
  trim: fc.constantFrom(0, 5, 10),
  sheets: fc.constantFrom([{ length: 2440, width: 1220 }], [{ length: 2438, width: 1219 }, { length: 1200, width: 800, qty: 2 }], [{ length: 1500, width: 900 }]),
  parts: fc.array(partArb, { minLength: 1, maxLength: 10 }),
});

describe('every plan can be cut as printed (fast-check)', () => {
  it('inside the trimmed sheet, one kerf apart, grain kept, every cut edge to edge of its piece, all parts placed', () => {
    fc.assert(
      fc.property(jobArb, (job) => {
        const plan = planSheets(job, { maxPasses: 40 });
        expect(checkSheetPlan(validateSheetJob(job), plan)).toEqual([]);
        expect(plan.lowerBound).toBeLessThanOrEqual(plan.sheetCount);
      }),
      { numRuns: 150, seed: 16 },
    );
  }, 60_000);
});

describe('the lower bound never exceeds the exhaustive optimum on small jobs', () => {
  it('up to 6 parts on a 100 × 60 sheet, with and without kerf and grain', () => {
    const small = fc.record({
      kerf: fc.constantFrom(0, 2),
      parts: fc.array(fc.record({ l: fc.integer({ min: 10, max: 100 }), w: fc.integer({ min: 10, max: 60 }), rotatable: fc.boolean() }), { minLength: 1, maxLength: 6 }),
    });
    fc.assert(
      fc.property(small, ({ kerf, parts }) => {
        const opt = bruteForceSheets(parts, 100, 60, kerf);
        const { lowerBound } = sheetLowerBound(parts, [{ L: 100, W: 60, qty: null }], kerf);
        expect(lowerBound).toBeLessThanOrEqual(opt);
        const plan = planSheets({ kerf, trim: 0, sheets: [{ length: 100, width: 60 }], parts: parts.map((p, i) => ({ length: p.l, width: p.w, qty: 1, label: `p${i}`, grain: !p.rotatable })) }, { maxPasses: 20 });
        expect(plan.sheetCount).toBeGreaterThanOrEqual(opt);
      }),
      { numRuns: 120, seed: 7 },
    );
  }, 60_000);
  it('the brute force itself: four 50 × 30 parts fill a 100 × 60 sheet exactly (no kerf) → 1; with 2 mm kerf (50 + 2 + 50 > 100, 30 + 2 + 30 > 60) one a sheet → 4', () => {
    const four = Array.from({ length: 4 }, () => ({ l: 50, w: 30, rotatable: false }));
    expect(bruteForceSheets(four, 100, 60, 0)).toBe(1);
    expect(bruteForceSheets(four, 100, 60, 2)).toBe(4);
  });
});
