import { describe, expect, it } from 'vitest';
import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { run } from '../../scripts/calc/beam';
import { calcCli } from './calc-helpers';

// Closed forms: AWC Design Aid No. 6 / AISC Manual Table 3-23 (REFERENCES.md [H]).
const tube = sectionOf(resolveProfile('tube:40x20x2'));
const E = tube.E_MPa;

describe('calc beam', () => {
  it('has exactly the documented fields', async () => {
    const out = await run(['--profile', '40x40-s8', '--span', '1 m', '--load', '500 N']);
    expect(Object.keys(out).sort()).toEqual(['E_MPa', 'I_mm4', 'deflection_mm', 'max_moment_Nmm', 'span_mm', 'stress_MPa'].sort());
  });

  it('centre load on a simple span: δ = PL³/48EI, M = PL/4, σ = M/W', async () => {
    const out = await run(['--profile', 'tube:40x20x2', '--span', '36 in', '--load', '112 lbf']);
    const L = 36 * 25.4;
    const P = 112 * 0.45359237 * 9.80665; // lbf in N (NIST SP 811)
    expect(out.span_mm).toBeCloseTo(L, 9);
    expect(out.I_mm4).toBeCloseTo(tube.Ix_mm4, 9);
    expect(out.deflection_mm).toBeCloseTo((P * L ** 3) / (48 * E * tube.Ix_mm4), 9);
    expect(out.max_moment_Nmm).toBeCloseTo((P * L) / 4, 6);
    expect(out.stress_MPa).toBeCloseTo((P * L) / 4 / tube.Wx_mm3, 9);
  });

  it('--at moves the load: δmax = Pb(L² − b²)^1.5/(9√3·EIL)', async () => {
    const out = await run(['--profile', 'tube:40x20x2', '--span', '1000', '--load', '200', '--at', '300 mm']);
    const [L, P, b] = [1000, 200, 300];
    expect(out.deflection_mm).toBeCloseTo((P * b * (L * L - b * b) ** 1.5) / (9 * Math.sqrt(3) * E * tube.Ix_mm4 * L), 9);
  });

  it('UDL on fixed ends (wL⁴/384EI) and on a cantilever (wL⁴/8EI)', async () => {
    const fixed = await run(['--profile', 'tube:40x20x2', '--span', '1 m', '--udl', '100 N/m', '--support', 'fixed']);
    expect(fixed.deflection_mm).toBeCloseTo((0.1 * 1000 ** 4) / (384 * E * tube.Ix_mm4), 9);
    const cant = await run(['--profile', 'tube:40x20x2', '--span', '500', '--udl', '0.1', '--support', 'cantilever']);
    expect(cant.deflection_mm).toBeCloseTo((0.1 * 500 ** 4) / (8 * E * tube.Ix_mm4), 9);
  });

  it('cantilever load defaults to the free end: δ = PL³/3EI, M = PL', async () => {
    const out = await run(['--profile', 'tube:40x20x2', '--span', '400', '--load', '50 N', '--support', 'cantilever']);
    expect(out.deflection_mm).toBeCloseTo((50 * 400 ** 3) / (3 * E * tube.Ix_mm4), 9);
    expect(out.max_moment_Nmm).toBeCloseTo(50 * 400, 9);
  });

  it('--axis y bends the profile about its y axis', async () => {
    const out = await run(['--profile', 'tube:40x20x2', '--span', '1 m', '--load', '500 N', '--axis', 'y']);
    expect(out.I_mm4).toBeCloseTo(tube.Iy_mm4, 9);
    expect(out.stress_MPa).toBeCloseTo((500 * 1000) / 4 / tube.Wy_mm3, 9);
  });

  it.each([
    [['--span', '1 m', '--load', '5 N'], /--profile: missing/],
    [['--profile', '40x40-s8', '--load', '5 N'], /--span: missing/],
    [['--profile', '40x40-s8', '--span', '1 m'], /--load or --udl/],
    [['--profile', '40x40-s8', '--span', '1 m', '--load', '5 N', '--udl', '1'], /--load, --udl/],
    [['--profile', '40x40-s8', '--span', '1 m', '--udl', '1', '--at', '5'], /--at/],
    [['--profile', '40x40-s8', '--span', '1 m', '--load', '5 N', '--at', '2 m'], /--at/],
    [['--profile', '40x40-s8', '--span', '1 m', '--load', '5 m'], /--load/],
    [['--profile', '40x40-s8', '--span', '5 kg', '--load', '5 N'], /--span/],
    [['--profile', '40x40-s8', '--span', '1 m', '--load', '5 N', '--support', 'pinned'], /--support/],
    [['--profile', '40x40-s8', '--span', '1 m', '--load', '5 N', '--axis', 'z'], /--axis/],
    [['--profile', 'nope', '--span', '1 m', '--load', '5 N'], /profile/],
    [['--profile', '40x40-s8', '--span', '1 m', '--load', '5 N', '--bogus', '1'], /bogus/],
  ])('rejects %j naming the flag', async (args, message) => {
    await expect(run(args)).rejects.toThrow(message);
  });

  it('works from the command line, and exits non-zero with a message on bad input', () => {
    const ok = calcCli(['beam', '--profile', '40x80-s8', '--span', '1.2 m', '--load', '25 kg']);
    expect(ok.code).toBe(0);
    const out = JSON.parse(ok.stdout);
    expect(out.span_mm).toBe(1200);
    expect(out.deflection_mm).toBeGreaterThan(0);
    const bad = calcCli(['beam', '--profile', '40x80-s8', '--span', '1.2 m']);
    expect(bad.code).not.toBe(0);
    expect(bad.stderr).toMatch(/--load or --udl/);
  }, 60_000); // spawns node processes on a shared machine
});
