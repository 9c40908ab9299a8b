import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import { bayFaceOpenings, defaultSheetGoodsOptions, drawerOpenings, reportWithSheetGoods, sheetGoods } from '@shared/panels/index';

// The example side galley (scripts/examples/side-galley-spec.json, invented): 40×40 slot 8 profile, 600 deep, 900
// high, seat at 120, bays of module width + 2 × clearance between the uprights' inner faces. Side-mount slides take
// 1/2 in a side (common practice, no source).
const spec = parseCabinetSpec(JSON.parse(readFileSync(new URL('../../../scripts/examples/side-galley-spec.json', import.meta.url), 'utf8')));
const doc = buildCabinetRun(spec);
const report = computeReport(doc);

describe('openings read off the example galley', () => {
  it('the drawer over the cooler: 400 + 2·10 = 420 between the uprights, 600 − 2·40 = 520 deep, 140 high, slides on the side rails', () => {
    const o = drawerOpenings(report).find((d) => d.module_id === 'cooler-drawer');
    expect(o).toBeDefined();
    expect(o?.width_mm).toBeCloseTo(420, 9);
    expect(o?.depth_mm).toBeCloseTo(520, 9);
    expect(o?.height_mm).toBeCloseTo(140, 9);
    expect(o?.support).toEqual({ left: 'member', right: 'member' });
  });
  it('the cooler bay’s back: 420 wide, from the seat rail’s top (120) to the top rail’s underside (900 − 40) = 740', () => {
    const f = bayFaceOpenings(report, 'bay-cooler');
    expect(f.back.length_mm).toBeCloseTo(420, 9);
    expect(f.back.width_mm).toBeCloseTo(740, 9);
    expect(f.back.crossed_by).toEqual([]);
    // The left end is crossed by the drawer's slide rail, in line with the uprights.
    expect(f.left?.crossed_by).toContain('bay-cooler-cooler-drawer-slide-l');
    expect(f.right).toBeNull();
  });
  it('sheet goods: the drawer box is 420 − 25.4 = 394.6 wide on a 500 mm slide; the back panel laps 40 mm: 500 × 820', () => {
    const g = sheetGoods(report, defaultSheetGoodsOptions());
    const d = g.drawers.find((x) => x.opening.module_id === 'cooler-drawer');
    expect(d?.box.box.width_mm).toBeCloseTo(394.6, 9);
    expect(d?.box.slide_length_mm).toBe(500);
    const back = g.parts.find((p) => p.name === 'bay-cooler: back');
    expect(back?.length_mm).toBeCloseTo(500, 9);
    expect(back?.width_mm).toBeCloseTo(820, 9);
    const top = g.parts.find((p) => p.name === 'Countertop');
    expect(top?.width_mm).toBeCloseTo(620, 9);
    expect(g.mass.total_kg).toBeGreaterThan(0);
  });
  it('the sheet goods’ mass reaches the report: its module mass rises by exactly their mass, and the loads with it', () => {
    const g = sheetGoods(report, defaultSheetGoodsOptions());
    const { report: after } = reportWithSheetGoods(doc);
    expect(after.mass.modules_kg - report.mass.modules_kg).toBeCloseTo(g.mass.total_kg, 3); // the report rounds its masses
    const load = (r: typeof report) => r.loads.members.reduce((a, c) => a + (c.utilisation ?? 0), 0);
    expect(load(after)).toBeGreaterThan(load(report));
    // The drawer's own box and face go to its own module.
    const drawerKg = g.parts.filter((p) => p.owner === 'cooler-drawer').reduce((a, p) => a + p.mass_kg, 0);
    const before = report.modules.find((m) => m.id === 'cooler-drawer')?.mass_kg ?? 0;
    expect((after.modules.find((m) => m.id === 'cooler-drawer')?.mass_kg ?? 0) - before).toBeGreaterThanOrEqual(drawerKg - 1e-3);
  });
  it('the goods’ hardware joins the hardware list with spares: slides, their screws into T-nuts, panel screws and drop-in T-nuts', () => {
    const g = sheetGoods(report, defaultSheetGoodsOptions());
    const { report: after } = reportWithSheetGoods(doc);
    const goodsLines = after.hardware.lines.filter((l) => l.key.startsWith('goods|'));
    expect(goodsLines.map((l) => l.count)).toEqual(g.hardware.map((l) => l.qty));
    const slides = goodsLines.find((l) => l.name.startsWith('Drawer slide pair'));
    expect(slides?.length_mm).toBe(500);
    expect(slides?.count).toBe(g.drawers.length);
    const tnuts = goodsLines.find((l) => l.kind === 't-nut');
    expect(tnuts?.count).toBe(g.hardware.find((l) => l.item === 'T-nut, drop-in')?.qty);
    for (const l of goodsLines) expect(l.order_qty).toBe(Math.ceil((l.count * (100 + after.hardware.spares_pct)) / 100 - 1e-9));
    // The frame's own lines are all still there.
    expect(after.hardware.lines.length - goodsLines.length).toBe(report.hardware.lines.length);
  });
});
