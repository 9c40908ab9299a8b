import { describe, expect, it } from 'vitest';
import { run } from '../../scripts/calc/drawer';
import { calcCli } from './calc-helpers';

// Side-mount: 1/2 in per side (common practice, no source). Under-mount preset values recalled [M].

type DrawerOut = {
  slide_length_mm: number;
  box: { width_mm: number; height_mm: number; length_mm: number };
  bottom: { width_mm: number; length_mm: number; groove_depth_mm: number };
  parts: { name: string; length_mm: number; width_mm: number; thickness_mm: number; qty: number }[];
};

// A child process per case: tsx starts slowly on a busy machine, hence the long timeouts.
describe('calc drawer', { timeout: 60_000 }, () => {
  it('side-mount in inches: 20 × 6 × 22 in, 1/2 in sides → box 19 × 5 × 22 in (482.6 × 127 × 558.8 mm)', async () => {
    const out = (await run(['--width', '20 in', '--height', '6 in', '--depth', '22 in', '--slide', 'side-mount', '--thickness', '1/2 in'])) as DrawerOut;
    expect(Object.keys(out)).toEqual(expect.arrayContaining(['slide_length_mm', 'box', 'bottom', 'parts']));
    expect(out.slide_length_mm).toBe(558.8);
    expect(out.box).toEqual({ width_mm: 482.6, height_mm: 127, length_mm: 558.8 });
    // Groove 1/4 in; bottom 18 + 1/2 in − 1 mm play = 468.9 mm by 21 1/2 in − 1 mm = 545.1 mm.
    expect(out.bottom).toEqual({ width_mm: 468.9, length_mm: 545.1, groove_depth_mm: 6.35 });
    expect(out.parts.map((p) => [p.name, p.qty])).toEqual([['Side', 2], ['Front', 1], ['Back', 1], ['Bottom', 1]]);
    for (const p of out.parts) for (const k of ['name', 'length_mm', 'width_mm', 'thickness_mm', 'qty']) expect(p).toHaveProperty(k);
  });

  it('under-mount in mm with the sheet’s values: 450 × 140 × 520, 15 mm sides, 5 mm a side, 14 mm recess → 440 wide on a 500 slide', async () => {
    const out = (await run(['--width', '450', '--height', '140', '--depth', '520', '--slide', 'under-mount', '--thickness', '15', '--side-deduction', '5', '--bottom-recess', '14'])) as DrawerOut;
    // Preset 1/4 in behind the slide: 520 − 6.35 = 513.65 room → 500; height 140 − 6.35 − 12.7 = 120.95.
    expect(out.slide_length_mm).toBe(500);
    expect(out.box).toEqual({ width_mm: 440, height_mm: 120.95, length_mm: 500 });
    expect(out.bottom.groove_depth_mm).toBe(7.5);
  });

  it('exits 1 naming --thickness when the sides are too thick for an under-mount slide', () => {
    const r = calcCli(['drawer', '--width', '450', '--height', '140', '--depth', '520', '--slide', 'under-mount', '--thickness', '19']);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('--thickness');
  });

  it('exits 1 naming --depth when no slide fits, and --slide for an unknown slide', () => {
    const shallow = calcCli(['drawer', '--width', '450', '--height', '140', '--depth', '200', '--slide', 'side-mount']);
    expect(shallow.code).toBe(1);
    expect(shallow.stderr).toContain('--depth');
    const odd = calcCli(['drawer', '--width', '450', '--height', '140', '--depth', '500', '--slide', 'wooden']);
    expect(odd.code).toBe(1);
    expect(odd.stderr).toContain('--slide');
  });
});
