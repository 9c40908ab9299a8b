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
  return runsOf(list, { name: 'Bench run', profile: '40x40-s8', depth_mm: 600, height_mm: 900, seat_mm: 120, clearance_mm: 10 }, 800);
}

/** A run holds at most MAX_BAYS bays: longer frames are runs of equal length, one behind another, `pitch` apart. */
function runsOf(list: CabinetBay[], base: Omit<CabinetSpec, 'bays'>, pitch: number): FrameDocument {
  const runs = Math.ceil(list.length / MAX_BAYS);
  const per = Math.ceil(list.length / runs);
  const spec = (k: number): CabinetSpec => ({ ...base, bays: list.slice(k * per, (k + 1) * per) });
  let doc = buildCabinetRun(spec(0));
  for (let k = 1; k < runs; k++) {
    const added = addCabinetRun(doc, spec(k), { x: 0, y: k * pitch, z: 0 });
    if (!added.ok) throw new Error(`${base.name}: ${added.reason}`);
    doc = added.doc;
  }
  return doc;
}


/**
 * A frame the editor's performance work was not tuned on, to report beside the tuned one: bays that stack two or
 * three modules (a drawer over a cooler, a shelf over a tank, two drawers under a hung sink) on a shallower, lower
 * run, with widths in another pattern. Bottom modules are named "Cooler k", "Drawers k" or "Tank k", the form the benchmark picks them by.
 */
export function heldOutFrame(bays = 16): FrameDocument {
  const list: CabinetBay[] = [];
  for (let k = 0; k < bays; k++) {
    const w = 320 + ((k * 53) % 180);
    const kind = k % 3;
    if (kind === 0) {
      list.push({
        id: `bay-${k}`,
        module: { id: `module-${k}`, name: `Cooler ${k}`, kind: 'appliance', bearing: 'base', size: { w_mm: w, d_mm: 460, h_mm: 400 }, mass_kg: 14, contents_kg: 16 },
        stack: [{ id: `top-${k}`, name: `Drawer over cooler ${k}`, kind: 'drawer-stack', bearing: 'side-rails', size: { w_mm: w, d_mm: 440, h_mm: 130 }, mass_kg: 4, contents_kg: 6 }],
      });
    } else if (kind === 1) {
      list.push({
        id: `bay-${k}`,
        clearance_mm: 12.7,
        module: { id: `module-${k}`, name: `Drawers ${k}`, kind: 'drawer-stack', bearing: 'side-rails', size: { w_mm: w, d_mm: 440, h_mm: 200 }, mass_kg: 6, contents_kg: 12, raise_mm: 20 },
        stack: [
          { id: `mid-${k}`, name: `Cutlery drawer ${k}`, kind: 'drawer-stack', bearing: 'side-rails', size: { w_mm: w, d_mm: 440, h_mm: 110 }, mass_kg: 3, contents_kg: 4 },
          { id: `sink-${k}`, name: `Sink ${k}`, kind: 'sink', bearing: 'hung', size: { w_mm: Math.min(w, 380), d_mm: 340, h_mm: 170 }, mass_kg: 6 },
        ],
      });
    } else {
      list.push({
        id: `bay-${k}`,
        module: { id: `module-${k}`, name: `Tank ${k}`, kind: 'tank', bearing: 'base', size: { w_mm: w, d_mm: 420, h_mm: 280 }, mass_kg: 3, litres: 30 },
        stack: [{ id: `shelf-${k}`, name: `Shelf ${k}`, kind: 'shelf', bearing: 'base', size: { w_mm: w, d_mm: 420, h_mm: 18 }, mass_kg: 2, contents_kg: 8 }],
      });
    }
  }
  return runsOf(list, { name: 'Held-out run', profile: '40x40-s8', depth_mm: 520, height_mm: 860, seat_mm: 100, clearance_mm: 10 }, 700);
}
