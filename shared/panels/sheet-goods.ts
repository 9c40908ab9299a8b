// Everything of sheet material a resolved frame needs: a drawer box and a face for every drawer module, panels on
// the bays' backs and the run's ends, and a countertop with the sink's cut-out. Parts carry their material, so the
// cut list groups them and the sheet planner nests each material on its own sheets; their mass and centre of
// gravity join the frame's.
import type { FrameReport } from '../engine/report-types';
import { lengthText } from '../display/format';
import { InputError } from '../errors';
import type { Vec3 } from '../model/axis';
import { bayPanel } from './bay-panels';
import { countertop } from './countertop';
import { drawerBox, type DrawerBox } from './drawer-box';
import { drawerFaces } from './drawer-faces';
import { partMass_kg, SHEET_MATERIALS, type SheetMaterial } from './materials';
import { bayFaceOpenings, drawerOpenings, type DrawerOpening } from './openings';
import type { HardwareLine, SheetPart } from './parts';
import { slidePreset, type SlideRules } from './slides';

export type SheetGoodsOptions = {
  slide: SlideRules;
  joint: 'butt' | 'dado';
  faceStyle: 'inset' | 'overlay';
  panelMount: 'slot' | 'surface';
  backs: boolean;
  sides: boolean;
  countertop: boolean;
  /** Sheet materials by use. */
  box: SheetMaterial;
  bottom: SheetMaterial;
  face: SheetMaterial;
  panel: SheetMaterial;
  top: SheetMaterial;
  /** Slot opening and face width of the frame's profile. */
  slot_mm: number;
  profile_mm: number;
};

const mat = (id: string): SheetMaterial => SHEET_MATERIALS.find((m) => m.id === id) as SheetMaterial;

export function defaultSheetGoodsOptions(): SheetGoodsOptions {
  return {
    slide: slidePreset('side-mount'),
    joint: 'butt',
    faceStyle: 'inset',
    panelMount: 'surface',
    backs: true,
    sides: true,
    countertop: true,
    box: mat('birch-12'),
    bottom: mat('birch-6'),
    face: mat('light-15'),
    panel: mat('light-6'),
    top: mat('birch-18'),
    slot_mm: 8,
    profile_mm: 40,
  };
}

export type PlacedPart = SheetPart & { material: SheetMaterial; mass_kg: number; owner: string; centre_mm: Vec3 };
/** Where a drawer box, panel or countertop sits in the frame, for drawing (thin boxes, frame millimetres). */
export type GoodsBox = { id: string; kind: 'drawer' | 'panel' | 'top'; min_mm: Vec3; max_mm: Vec3 };

export type SheetGoods = {
  boxes: GoodsBox[];
  drawers: { opening: DrawerOpening; box: DrawerBox; face: { width_mm: number; height_mm: number } }[];
  parts: PlacedPart[];
  hardware: HardwareLine[];
  mass: { total_kg: number; cog_mm: Vec3 | null; by_material: { material: string; mass_kg: number; typical: boolean }[] };
  notes: string[];
};

const centre = (a: Vec3, b: Vec3): Vec3 => ({ x: (a.x + b.x) / 2, y: (a.y + b.y) / 2, z: (a.z + b.z) / 2 });

export function sheetGoods(report: FrameReport, opts: SheetGoodsOptions = defaultSheetGoodsOptions()): SheetGoods {
  const parts: PlacedPart[] = [];
  const hardware: HardwareLine[] = [];
  const notes: string[] = [];
  const boxes: GoodsBox[] = [];
  const add = (p: SheetPart, material: SheetMaterial, owner: string, at: Vec3) => {
    parts.push({ ...p, thickness_mm: material.thickness_mm, material, owner, centre_mm: at, mass_kg: p.qty * partMass_kg(p.length_mm, p.width_mm, material.thickness_mm, material.density_kg_m3) });
  };
  const drawers: SheetGoods['drawers'] = [];
  // Notes are read on screen and paper, so their lengths are in the frame's own unit like every other figure.
  const text = (mm: number) => lengthText(mm, report.units);
  for (const o of drawerOpenings(report)) {
    let box: DrawerBox;
    try {
      box = drawerBox({ opening: { width_mm: o.width_mm, height_mm: o.height_mm, depth_mm: o.depth_mm }, slide: opts.slide, joint: opts.joint, thickness_mm: opts.box.thickness_mm, bottomThickness_mm: opts.bottom.thickness_mm, support: o.support }, text);
    } catch (err) {
      // One drawer that cannot be sized (too shallow for any slide…) must not hide every other part.
      if (!(err instanceof InputError)) throw err;
      notes.push(`${o.name}: no drawer box — ${err.message}`);
      continue;
    }
    const at = centre(o.min_mm, o.max_mm);
    for (const p of box.parts) add({ ...p, name: `${o.name}: ${p.name.toLowerCase()}` }, p.name === 'Bottom' ? opts.bottom : opts.box, o.module_id, at);
    const faces = drawerFaces({ opening: { width_mm: o.width_mm, height_mm: o.height_mm }, style: opts.faceStyle, shares: [1], thickness_mm: opts.face.thickness_mm });
    for (const p of faces.parts) add({ ...p, name: `${o.name}: face` }, opts.face, o.module_id, { ...at, y: o.min_mm.y });
    hardware.push(...box.hardware, ...faces.hardware);
    drawers.push({ opening: o, box, face: { width_mm: faces.faces[0].width_mm, height_mm: faces.faces[0].height_mm } });
    const x0 = o.min_mm.x + opts.slide.sideDeduction_mm;
    const z0 = o.min_mm.z + opts.slide.bottomClearance_mm;
    boxes.push({ id: o.module_id, kind: 'drawer', min_mm: { x: x0, y: o.min_mm.y, z: z0 }, max_mm: { x: x0 + box.box.width_mm, y: o.min_mm.y + box.box.length_mm, z: z0 + box.box.height_mm } });
  }
  for (const bay of report.bays) {
    const f = bayFaceOpenings(report, bay.id);
    const panel = (name: string, face: typeof f.back, at: Vec3, plane: 'x' | 'y', outward: 1 | -1) => {
      let mount = opts.panelMount;
      if (mount === 'slot' && face.crossed_by.length) {
        notes.push(`${name}: a member crosses it (${face.crossed_by.join(', ')}), so it is mounted on the surface`);
        mount = 'surface';
      }
      const p = bayPanel({ name, opening: { length_mm: face.length_mm, width_mm: face.width_mm }, mount, thickness_mm: opts.panel.thickness_mm, slot_mm: opts.slot_mm, profile_mm: opts.profile_mm });
      add(p.part, opts.panel, bay.id, at);
      hardware.push(...p.hardware);
      // Drawn on the face's plane, grown by its lap in the face's two directions, its thickness outward.
      const grow = (p.part.length_mm - face.length_mm) / 2;
      const min = { ...face.min_mm };
      const max = { ...face.max_mm };
      for (const a of ['x', 'y', 'z'] as const) {
        if (a === plane) continue;
        min[a] -= grow;
        max[a] += grow;
      }
      if (outward > 0) max[plane] = min[plane] + opts.panel.thickness_mm;
      else min[plane] = max[plane] - opts.panel.thickness_mm;
      boxes.push({ id: name, kind: 'panel', min_mm: min, max_mm: max });
    };
    if (opts.backs) panel(`${bay.id}: back`, f.back, centre(f.back.min_mm, f.back.max_mm), 'y', 1);
    if (opts.sides && f.left) panel(`${bay.id}: left side`, f.left, centre(f.left.min_mm, f.left.max_mm), 'x', -1);
    if (opts.sides && f.right) panel(`${bay.id}: right side`, f.right, centre(f.right.min_mm, f.right.max_mm), 'x', 1);
  }
  if (opts.countertop && report.members.length) {
    const ms = report.members;
    const min = { x: Math.min(...ms.map((m) => m.min_mm.x)), y: Math.min(...ms.map((m) => m.min_mm.y)) };
    const max = { x: Math.max(...ms.map((m) => m.max_mm.x)), y: Math.max(...ms.map((m) => m.max_mm.y)), z: Math.max(...ms.map((m) => m.max_mm.z)) };
    const sink = report.modules.find((m) => m.kind === 'sink');
    try {
      const top = countertop({
        run: { length_mm: max.x - min.x, depth_mm: max.y - min.y },
        thickness_mm: opts.top.thickness_mm,
        ...(sink ? { sink: { x_mm: sink.min_mm.x - min.x, y_mm: sink.min_mm.y - min.y, w_mm: sink.max_mm.x - sink.min_mm.x, d_mm: sink.max_mm.y - sink.min_mm.y } } : {}),
      }, text);
      const cut = top.cutout ? top.cutout.length_mm * top.cutout.width_mm : 0;
      add(top.part, opts.top, 'countertop', { x: (min.x + max.x) / 2, y: (min.y + max.y) / 2, z: max.z + opts.top.thickness_mm / 2 });
      boxes.push({ id: 'countertop', kind: 'top', min_mm: { x: min.x, y: max.y - top.part.width_mm, z: max.z }, max_mm: { x: max.x, y: max.y, z: max.z + opts.top.thickness_mm } });
      // The cut-out's offcut is not on the top: take its mass off (area fraction).
      const last = parts[parts.length - 1];
      last.mass_kg *= 1 - cut / (top.part.length_mm * top.part.width_mm);
      notes.push(...top.notes);
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      notes.push(`Countertop: not sized — ${err.message}`);
    }
  }
  const total = parts.reduce((a, p) => a + p.mass_kg, 0);
  const cog = total > 0 ? (['x', 'y', 'z'] as const).reduce((c, k) => ({ ...c, [k]: parts.reduce((a, p) => a + p.mass_kg * p.centre_mm[k], 0) / total }), { x: 0, y: 0, z: 0 } as Vec3) : null;
  const byMat = new Map<string, { material: string; mass_kg: number; typical: boolean }>();
  for (const p of parts) {
    const e = byMat.get(p.material.id) ?? { material: p.material.name, mass_kg: 0, typical: p.material.typical };
    e.mass_kg += p.mass_kg;
    byMat.set(p.material.id, e);
  }
  return { boxes, drawers, parts, hardware: mergeHardware(hardware), mass: { total_kg: total, cog_mm: cog, by_material: [...byMat.values()] }, notes };
}

function mergeHardware(lines: HardwareLine[]): HardwareLine[] {
  const by = new Map<string, HardwareLine>();
  for (const l of lines) {
    const e = by.get(l.item);
    if (e) e.qty += l.qty;
    else by.set(l.item, { ...l });
  }
  return [...by.values()];
}
