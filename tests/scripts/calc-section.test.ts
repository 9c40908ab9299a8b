import { describe, expect, it } from 'vitest';
import { run } from '../../scripts/calc/section';
import { calcCli } from './calc-helpers';

describe('calc section', () => {
  it('has exactly the documented fields', async () => {
    const out = await run(['40x40-s8']);
    expect(Object.keys(out).sort()).toEqual(
      ['E_MPa', 'Iy_mm4', 'Ix_mm4', 'Wx_mm3', 'Wy_mm3', 'alloy', 'area_mm2', 'mass_kg_per_m', 'profile', 'Ixy_mm4', 'I1_mm4', 'I2_mm4', 'angle_deg'].sort(),
    );
    expect(out.profile).toBe('40x40-s8');
    expect(out.alloy).toBe('6063-T5');
  });

  it('gives handbook values for a plain tube: I = (BH³ − bh³)/12, W = I/(H/2) [H]', async () => {
    const out = await run(['tube:40x20x2']);
    expect(out.Ix_mm4).toBeCloseTo((40 * 20 ** 3 - 36 * 16 ** 3) / 12, 6);
    expect(out.Wx_mm3).toBeCloseTo(out.Ix_mm4 / 10, 6);
    // 224 mm² × 2700 kg/m³ (MatWeb density of 6063) = 0.6048 kg/m.
    expect(out.mass_kg_per_m).toBeCloseTo(0.6048, 9);
    expect(out.E_MPa).toBe(68_900);
  });

  it('gives the principal axes of an angle: I₁,₂ = (Ix + Iy)/2 ± √(((Ix − Iy)/2)² + Ixy²), 45° for an equal angle (Roark, Table A.1)', async () => {
    const out = await run(['angle:40x40x4']);
    expect(out.Ixy_mm4).toBeLessThan(0);
    expect(out.I1_mm4).toBeCloseTo(out.Ix_mm4 - out.Ixy_mm4, 6);
    expect(out.I2_mm4).toBeCloseTo(out.Ix_mm4 + out.Ixy_mm4, 6);
    expect(out.angle_deg).toBeCloseTo(45, 9);
    const sym = await run(['40x40-s8']);
    expect(Math.abs(sym.Ixy_mm4)).toBeLessThan(1e-6 * sym.Ix_mm4);
  });

  it('names the profile in the error for an unknown one', async () => {
    await expect(run(['50x50-s9'])).rejects.toThrow(/profile/);
    await expect(run([])).rejects.toThrow(/profile/);
  });

  it('exits non-zero with a message on stderr from the command line', () => {
    const ok = calcCli(['section', '1x1']);
    expect(ok.code).toBe(0);
    expect(JSON.parse(ok.stdout).profile).toBe('1x1');
    const bad = calcCli(['section', 'nope']);
    expect(bad.code).not.toBe(0);
    expect(bad.stderr).toMatch(/profile: "nope" is not a known profile/);
    expect(bad.stdout).toBe('');
  }, 60_000); // spawns node processes on a shared machine
});
