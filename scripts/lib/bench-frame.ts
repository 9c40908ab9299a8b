import { addCabinetRun } from '@shared/editing/cabinet';
import { buildCabinetRun, MAX_BAYS, type CabinetBay, type CabinetSpec } from '@shared/model/cabinet-run';
import type { FrameDocument } from '@shared/model/frame-document';

// The benchmarks' generated frame, invented for them: one long cabinet run (the report, editor and API benchmarks
// all measure this one frame).

/** Long cabinet runs: bays alternating base modules and side-rail drawers, 10 members a bay (+4 a run). */
export function benchFrame(bays = 50): FrameDocument {
  const list: CabinetBay[] = [];
  for (let k = 0; k < bays; k++) {
    const base = k % 2 === 0;
    list.push({
      id: `bay-${k}`,
      clearance_mm: base ? 10 : 12.7,
      module: {
        id: `module-${k}`,
        name: base ? `Cooler ${k}` : `Drawers ${k}`,
        kind: base ? 'appliance' : 'drawer-stack',
        bearing: base ? 'base' : 'side-rails',
        size: { w_mm: 300 + ((k * 37) % 200), d_mm: 400, h_mm: base ? 420 : 300 },
        mass_kg: base ? 15 : 8,
        contents_kg: base ? 15 : 10,
        raise_mm: base ? 0 : 100,
      },
    });
  }
  // A run holds at most MAX_BAYS bays: longer frames are runs of equal length, one behind another.
  const runs = Math.ceil(bays / MAX_BAYS);
  const per = Math.ceil(bays / runs);
  const spec = (k: number): CabinetSpec => ({
    name: 'Bench run',
    profile: '40x40-s8',
    depth_mm: 600,
    height_mm: 900,
    seat_mm: 120,
    clearance_mm: 10,
    bays: list.slice(k * per, (k + 1) * per),
  });
  let doc = buildCabinetRun(spec(0));
  for (let k = 1; k < runs; k++) {
    const added = addCabinetRun(doc, spec(k), { x: 0, y: k * 800, z: 0 });
    if (!added.ok) throw new Error(`bench frame: ${added.reason}`);
    doc = added.doc;
  }
  return doc;
}

