import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { run } from '../../scripts/calc/cut';
import { calcCli } from './calc-helpers';

const dir = mkdtempSync(join(tmpdir(), 'calc-cut-'));
function jobFile(name: string, job: unknown): string {
  const f = join(dir, name);
  writeFileSync(f, JSON.stringify(job));
  return f;
}

interface CutOut {
  barCount: number;
  lowerBound: number;
  optimal: boolean;
  cost: number;
  waste_pct: number;
  bars: { stock: number; cuts: { length: number; label: string }[]; offcut: number }[];
}

describe('calc cut', () => {
  it('answers the documented example with the documented fields', async () => {
    const f = jobFile('a.json', { kerf: 3, trim: 0, minOffcut: 100, stock: [{ length: 6000, price: 30, qty: null }], parts: [{ length: 1200, qty: 4, label: 'A' }] });
    const out = (await run([f])) as CutOut;
    for (const k of ['barCount', 'lowerBound', 'optimal', 'cost', 'waste_pct', 'bars']) expect(out).toHaveProperty(k);
    // By hand: 4 × 1200 + 3 × 3 = 4809 ≤ 6000, leftover 1191, offcut after one more kerf 1188.
    expect(out.barCount).toBe(1);
    expect(out.lowerBound).toBe(1);
    expect(out.optimal).toBe(true);
    expect(out.cost).toBe(30);
    expect(out.bars[0].stock).toBe(6000);
    expect(out.bars[0].cuts).toEqual(Array.from({ length: 4 }, () => ({ length: 1200, label: 'A' })));
    expect(out.bars[0].offcut).toBe(1188);
    expect(out.waste_pct).toBeCloseTo((12 / 6000) * 100, 9);
  });

  it('needs ⌈9 / 4⌉ = 3 bars when nine 1400 mm parts are cut from 6 m (4 × 1400 + 9 = 5609; 5 would need 7012)', async () => {
    const f = jobFile('b.json', { kerf: 3, trim: 5, minOffcut: 100, stock: [{ length: 6000 }], parts: [{ length: 1400, qty: 9, label: 'R' }] });
    const out = (await run([f])) as CutOut;
    expect(out.barCount).toBe(3);
    expect(out.optimal).toBe(true);
  });

  it('exits 1 with a message naming the part that is too long', () => {
    const f = jobFile('bad.json', { kerf: 3, stock: [{ length: 2000 }], parts: [{ length: 2400, qty: 1, label: 'A' }] });
    const r = calcCli(['cut', f]);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain("part 'A' (2400 mm) is longer than every stock bar (2000 mm)");
  });

  it('prints JSON on stdout from the command line', () => {
    const f = jobFile('c.json', { kerf: 3, stock: [{ length: 3000 }], parts: [{ length: 1000, qty: 2, label: 'P' }] });
    const r = calcCli(['cut', f]);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as CutOut;
    expect(out.barCount).toBe(1);
  });
});
