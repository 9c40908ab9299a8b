import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { calcCli } from './calc-helpers';

const dir = mkdtempSync(join(tmpdir(), 'calc-sheets-'));
function jobFile(name: string, job: unknown): string {
  const f = join(dir, name);
  writeFileSync(f, JSON.stringify(job));
  return f;
}

type SheetsOut = {
  sheetCount: number;
  lowerBound: number;
  waste_pct: number;
  sheets: { length: number; width: number; placements: { label: string; x: number; y: number; length: number; width: number; rotated: boolean }[]; cuts: { x1: number; y1: number; x2: number; y2: number }[] }[];
};

// A child process per case: tsx starts slowly on a busy machine, hence the long timeouts.
describe('calc sheets', { timeout: 60_000 }, () => {
  it('prints the documented fields; six 600 × 400 grain parts on one trimmed 2440 × 1220 sheet', () => {
    // Trimmed 2420 × 1200: 3·600 + 2·3 = 1806 along, 2·400 + 3 = 803 across → 6 fit on one sheet (3 across is 1206 > 1200).
    const f = jobFile('a.json', { kerf: 3, trim: 10, sheets: [{ length: 2440, width: 1220, price: 60 }], parts: [{ length: 600, width: 400, qty: 6, label: 'Door', grain: true }] });
    const r = calcCli(['sheets', f]);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as SheetsOut;
    for (const k of ['sheetCount', 'lowerBound', 'waste_pct', 'sheets']) expect(out).toHaveProperty(k);
    expect(out.sheetCount).toBe(1);
    expect(out.lowerBound).toBe(1);
    expect(out.waste_pct).toBeCloseTo((1 - (6 * 600 * 400) / (2440 * 1220)) * 100, 2);
    const s = out.sheets[0];
    expect(s.placements).toHaveLength(6);
    for (const p of s.placements) for (const k of ['label', 'x', 'y', 'length', 'width', 'rotated']) expect(p).toHaveProperty(k);
    expect(s.cuts.length).toBeGreaterThan(0);
    for (const c of s.cuts) for (const k of ['x1', 'y1', 'x2', 'y2']) expect(c).toHaveProperty(k);
  });

  it('exits 1 naming the part that fits no sheet', () => {
    const f = jobFile('b.json', { kerf: 3, trim: 10, sheets: [{ length: 2440, width: 1220 }], parts: [{ length: 2430, width: 300, qty: 1, label: 'Worktop', grain: true }] });
    const r = calcCli(['sheets', f]);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain("part 'Worktop'");
  });

  it('exits 1 naming the field out of bounds', () => {
    const f = jobFile('c.json', { kerf: 3, sheets: [{ length: 2440, width: 1220 }], parts: [{ length: 500, width: 300, qty: 0, label: 'A' }] });
    const r = calcCli(['sheets', f]);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('parts[0].qty');
  });
});
