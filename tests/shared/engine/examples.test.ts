import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { computeReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';

const example = (name: string) => parseFrameDocument(JSON.parse(readFileSync(new URL(`../../../scripts/examples/${name}.json`, import.meta.url), 'utf8')));
const IN = 25.4; // mm per inch, exact (NIST)

describe('workshop bench example (hand-drawn, 40×40 legs, 40×80 top rails)', () => {
  const r = computeReport(example('workshop-bench'));

  it('cuts by hand', () => {
    // Legs floor to top: 900. Rails between legs: 1500 − 2 × 40 = 1420. Cross-members: 700 − 2 × 40 = 620;
    // the middle one spans between the top rails' inner faces, 660 − 40 = 620 too.
    expect(r.cut_list.map((c) => [c.profile, c.cut_length_mm, c.qty])).toEqual([
      ['40x40-s8', 1420, 2],
      ['40x40-s8', 900, 4],
      ['40x40-s8', 620, 5],
      ['40x80-s8', 1420, 2],
    ]);
  });

  it('checks the shelf rails under the tool chest by hand (AWC DA6 Fig. 1, shock factor 1 for a bench)', () => {
    // 45 kg over the full 1420 mm of two rails: w = 45 × 9.80665 / 2 / 1420 N/mm; δ = 5wL⁴/384EI.
    const s = sectionOf(resolveProfile('40x40-s8'));
    // Plus the rail's own weight, a UDL too (AISC Manual Table 3-23): mass per metre × g.
    const w = (45 * 9.80665) / 2 / 1420 + (s.mass_kg_per_m / 1000) * 9.80665;
    const c = r.loads.members.find((m) => m.member_id === 'S1');
    expect(c?.spans[0].deflection_mm).toBeCloseTo((5 * w * 1420 ** 4) / (384 * s.E_MPa * s.Ix_mm4), 4);
  });

  it('adds up the mass: 40×40 length × its mass per metre + 40×80 length × its own + 70 kg of modules', () => {
    const m40 = sectionOf(resolveProfile('40x40-s8')).mass_kg_per_m;
    const m80 = sectionOf(resolveProfile('40x80-s8')).mass_kg_per_m;
    // 40×40: 2 × 1420 + 4 × 900 + 5 × 620 = 9540 mm; 40×80: 2 × 1420 = 2840 mm.
    expect(r.mass.frame_kg).toBeCloseTo(9.54 * m40 + 2.84 * m80, 4);
    expect(r.mass.modules_kg).toBe(70);
    expect(r.mass.hardware_approximate).toBe(true);
  });
});

describe('garage shelf example (1.5 in profile, inches to 1/16, ISO 2768-1 c, 0.8 mm allowance per butting end)', () => {
  const r = computeReport(example('garage-shelf-inch'));

  it('prints cut lengths to the nearest 1/16 in (1 in = 25.4 mm exactly, NIST)', () => {
    // Posts 48 in, free ends: 1219.2 mm → 48". Rails 36 − 2 × 1.5 = 33 in = 838.2 mm, + 2 × 0.8 = 839.8 mm =
    // 33.0630 in → ×16 = 529.01 → 33 1/16". Cross-members 18 − 3 = 15 in = 381 + 1.6 = 382.6 mm → 15 1/16".
    expect(r.cut_list.map((c) => [c.cut_length_text, c.qty])).toEqual([
      ['48"', 4],
      ['33 1/16"', 4],
      ['15 1/16"', 4],
    ]);
    const lengths = r.cut_list.map((c) => c.cut_length_mm);
    [48 * IN, 33 * IN + 1.6, 15 * IN + 1.6].forEach((v, k) => expect(lengths[k]).toBeCloseTo(v, 6));
    // ISO 2768-1 c: 1000–2000 mm ±3, 400–1000 mm ±2 (REFERENCES.md).
    expect(r.cut_list.slice(0, 2).map((c) => c.tolerance_mm)).toEqual([3, 2]);
  });

  it('uses the inch fastener: 5/16-18 screws, bracket 3/16 in + 7/16 in engagement = 5/8 in', () => {
    const screw = r.hardware.lines.find((l) => l.kind === 'screw');
    expect(screw).toMatchObject({ size: '5/16-18', name: 'cap screw 5/16-18 × 5/8 in' });
    expect(screw?.length_mm).toBeCloseTo((5 / 8) * IN, 9);
  });
});
