import { describe, expect, it } from 'vitest';
import { applyChange, diffDocuments, invertChange } from '@shared/editing/change';
import { applyModuleOption, setModuleOptions } from '@shared/editing/options';
import { compareModuleOptions } from '@shared/engine/options';
import { computeReport } from '@shared/engine/report';
import { galleyDoc } from '../editing/cabinet-fixtures';

describe('comparing a module’s options (the galley sink: 5, 9 and 25 kg, invented example weights)', () => {
  const doc = galleyDoc();
  const r0 = computeReport(doc);
  const rows = compareModuleOptions(doc, 'sink');

  it('lists the module as it is now, then each option', () => {
    expect(rows.map((o) => o.name)).toEqual(['Sink with tap (as now)', 'Pressed-steel sink', 'Composite sink', 'Fireclay sink']);
    expect(rows[0].total_kg).toBe(r0.mass.total_kg);
  });

  it('adds up the mass: the total changes by the option’s mass less the present one', () => {
    expect(rows[2].total_kg - rows[0].total_kg).toBeCloseTo(9 - 5, 4);
    expect(rows[2].module_kg).toBe(9);
    // The fireclay one is wider too, so the frame changes with it; the module itself is 25 kg.
    expect(rows[3].module_kg).toBe(25);
  });

  it('moves the centre of gravity towards the sink as the weighted mean says (4 kg more at the sink’s centre)', () => {
    const sink = r0.modules.find((m) => m.id === 'sink')!;
    const M = r0.mass.total_kg;
    const cog = r0.mass.cog_mm!;
    for (const a of ['x', 'y', 'z'] as const) {
      const c = (sink.min_mm[a] + sink.max_mm[a]) / 2;
      // Report centres are to 0.1 mm.
      expect(Math.abs(rows[2].cog_mm![a] - (M * cog[a] + 4 * c) / (M + 4))).toBeLessThan(0.11);
    }
  });

  it('loads the sink’s hangers more with a heavier sink, at most in proportion (linear elastic beam: u = a + b·m, a ≥ 0)', () => {
    const [, steel, composite, fireclay] = rows;
    expect(steel.bearing?.member_id).toMatch(/hanger/);
    expect(composite.bearing!.utilisation).toBeGreaterThan(steel.bearing!.utilisation);
    expect(composite.bearing!.utilisation / steel.bearing!.utilisation).toBeLessThanOrEqual(9 / 5 + 1e-3); // utilisations are reported to 5 decimals
    expect(fireclay.bearing!.deflection_mm).toBeGreaterThan(composite.bearing!.deflection_mm);
    expect(fireclay.governing!.utilisation).toBeGreaterThanOrEqual(fireclay.bearing!.utilisation);
  });

  it('says what the cut list would change: a wider sink widens its bay and its four rails', () => {
    expect(rows[2].cut_list).toMatchObject({ longer: 0, shorter: 0, new: 0, removed: 0 });
    // Fireclay 480 wide > the drawers’ 450: the bay goes from 450 + 25.4 to 480 + 25.4, its rails 30 mm longer.
    expect(rows[3].cut_list.longer).toBe(4);
    for (const p of rows[3].cut_list.changed) expect(p.cut_length_after_mm! - p.cut_length_before_mm!).toBeCloseTo(30, 6);
  });

  it('applies an option as one undo step, keeping the present one to switch back to', () => {
    const out = applyModuleOption(doc, 'sink', 1);
    if (!out.ok) throw new Error(out.reason);
    const change = diffDocuments(doc, out.doc, out.label);
    expect(change.ops).toHaveLength(1);
    expect(out.doc.modules.find((m) => m.id === 'sink')?.mass_kg).toBe(9);
    expect(applyChange(out.doc, invertChange(change))).toEqual(doc);
    expect(out.label).toBe('Use Composite sink for “Sink with tap”');
    // The present values match the pressed-steel option, so no option is added.
    expect(out.doc.modules.find((m) => m.id === 'sink')?.options).toHaveLength(3);
  });

  it('checks typed options, naming the field in words', () => {
    const r = setModuleOptions(doc, 'sink', [{ name: 'Cast sink', mass_kg: -1 }]);
    expect(r.ok ? '' : r.reason).toBe('Option 1: its mass must not be negative.');
  });
});
