import { describe, expect, it } from 'vitest';
import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { run } from '../../scripts/calc/column';
import { calcCli } from './calc-helpers';

// Euler N_cr = π²EI/(KL)² about the weak axis; EN 1999-1-1 §6.3.1 buckling resistance (recalled [M], REFERENCES.md).
describe('calc column', () => {
  it('has exactly the documented fields', async () => {
    const out = await run(['--profile', '20x20-s6', '--length', '2 m', '--load', '429 N', '--k', '1']);
    expect(Object.keys(out).sort()).toEqual(['profile', 'length_mm', 'K', 'slenderness', 'euler_N', 'capacity_N', 'utilisation', 'source'].sort());
    expect(out.source).toMatch(/EN 1999-1-1/);
  });

  it('the legs of the load review: 2 m of 20×20, Euler 1280 N at K = 1 and 320 N at K = 2', async () => {
    const s = sectionOf(resolveProfile('20x20-s6'));
    const I = Math.min(s.Ix_mm4, s.Iy_mm4);
    const k1 = await run(['--profile', '20x20-s6', '--length', '2 m', '--load', '429 N', '--k', '1']);
    const k2 = await run(['--profile', '20x20-s6', '--length', '2000', '--load', '429 N', '--k', '2']);
    expect(k1.euler_N).toBeCloseTo((Math.PI ** 2 * s.E_MPa * I) / 2000 ** 2, 6);
    expect(Math.round(k1.euler_N / 10) * 10).toBe(1280);
    expect(Math.round(k2.euler_N / 10) * 10).toBe(320);
    expect(k2.utilisation).toBeGreaterThan(1);
    expect(k2.utilisation).toBeCloseTo(429 / k2.capacity_N, 9);
    expect(k2.slenderness).toBeCloseTo(4000 / Math.sqrt(I / s.area_mm2), 6);
    // K defaults to 2, the safe side.
    expect((await run(['--profile', '20x20-s6', '--length', '2 m', '--load', '429 N'])).K).toBe(2);
  });

  it('names the bad argument', async () => {
    await expect(run(['--profile', '20x20-s6', '--length', '2 m', '--load', '429 N', '--k', '0'])).rejects.toThrow(/--k/);
    await expect(run(['--profile', '20x20-s6', '--load', '429 N'])).rejects.toThrow(/--length/);
    const bad = calcCli(['column', '--profile', 'nope', '--length', '1 m', '--load', '1 N']);
    expect(bad.code).not.toBe(0);
    expect(bad.stderr).toMatch(/profile/);
  }, 60_000);
});
