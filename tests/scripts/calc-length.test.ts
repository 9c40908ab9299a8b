import { describe, expect, it } from 'vitest';
import { run } from '../../scripts/calc/length';
import { calcCli } from './calc-helpers';

// 1 in = 25.4 mm exactly (NIST; US Federal Register, 1 July 1959).
describe('calc length', () => {
  it('gives mm, inches and both texts', async () => {
    // 16 31/32 in = 16.96875 × 25.4 = 431.00625 mm.
    expect(await run(['16 31/32 in', '--frac', '32'])).toEqual({ mm: 431.00625, inches: 16.96875, text_mm: '431 mm', text_in: '16 31/32"' });
    // 29.5 in = 749.3 mm.
    expect(await run(['29 1/2 in'])).toEqual({ mm: 749.3, inches: 29.5, text_mm: '749.3 mm', text_in: '29 1/2"' });
  });

  it('rounds to 1/16 by default', async () => {
    // 429.5 mm = 16.90945 in: ×16 = 270.55 → 16 15/16; ×32 = 541.10 → 16 29/32.
    expect((await run(['429.5'])).text_in).toBe('16 15/16"');
    expect((await run(['429.5', '--frac', '32'])).text_in).toBe('16 29/32"');
  });

  it('reads a bare number in the unit asked for, and a decimal comma when told', async () => {
    // 29 1/2 in = 29.5 × 25.4 = 749.3 mm; 2 ft 3-1/2 in = 27.5 in = 698.5 mm.
    expect((await run(['29 1/2', '--bare', 'in'])).mm).toBe(749.3);
    expect((await run(['2 ft 3-1/2 in'])).mm).toBe(698.5);
    expect((await run(['1,5 m', '--decimal-comma'])).mm).toBe(1500);
    await expect(run(['1,5 m'])).rejects.toThrow(/comma/);
    await expect(run(['12', '--bare', 'ft'])).rejects.toThrow(/--bare/);
  });

  it('rejects a bad fraction, a missing expression and a non-length', async () => {
    await expect(run(['100', '--frac', '10'])).rejects.toThrow(/--frac/);
    await expect(run([])).rejects.toThrow(/length/);
    await expect(run(['25 kg'])).rejects.toThrow(/length: "25 kg" is a mass/);
  });

  it('works from the command line, and fails with a non-zero exit and a message', () => {
    const ok = calcCli(['length', '3 ft - 20 mm']);
    expect(ok.code).toBe(0);
    expect(JSON.parse(ok.stdout).mm).toBeCloseTo(894.4, 9); // 914.4 − 20
    const bad = calcCli(['length', 'twelve']);
    expect(bad.code).not.toBe(0);
    expect(bad.stderr).toMatch(/length/);
  }, 60_000); // spawns node processes on a shared machine
});
