// The frame's report with its sheet goods in it: the drawers', panels' and countertop's mass carried by the modules
// (so mass, centre of gravity and the member checks see it) and their slides, screws, T-nuts and brackets on the
// hardware list the builder orders from. The engine's report stays the frame alone; this is the next step of the
// pipeline, so the editor, the shop documents and the command line can each choose it.
import { computeReport, type FrameReport, type ReportOptions } from '../engine/report';
import type { HardwareLine as ReportHardwareLine, HardwareKind } from '../engine/hardware';
import { massText } from '../display/format';
import { InputError } from '../errors';
import type { FrameDocument } from '../model/frame-document';
import type { HardwareLine } from './parts';
import { goodsOptionsOf } from './goods-options';
import { sheetGoods, type SheetGoods, type SheetGoodsOptions } from './sheet-goods';

/** Rough unit masses in grams for the goods' hardware (from memory, not a maker's data; the report marks hardware mass approximate). */
const UNIT_MASS_G: [RegExp, HardwareKind, number][] = [
  [/^Drawer slide pair/, 'part', 1200],
  [/^L-bracket/, 'bracket', 40],
  [/^T-nut/, 't-nut', 5],
  [/^Machine screw and nut/, 'screw', 6],
  [/screw/i, 'screw', 3],
];

const isGoodsLine = (l: ReportHardwareLine) => l.key.startsWith('goods|');

function toReportLine(l: HardwareLine, sparesPct: number): ReportHardwareLine {
  const [, kind, g] = UNIT_MASS_G.find(([re]) => re.test(l.item)) ?? [/./, 'part' as HardwareKind, 10];
  // A length in the item's name ("…, 500 mm") moves to its own field, so the list shows it in the builder's unit.
  const m = /^(.*), (\d+(?:\.\d+)?) mm$/.exec(l.item);
  return {
    key: `goods|${l.item}`,
    kind,
    name: m ? m[1] : l.item,
    size: null,
    length_mm: m ? Number(m[2]) : null,
    count: l.qty,
    order_qty: Math.ceil((l.qty * (100 + sparesPct)) / 100 - 1e-9),
    unit_mass_g: g,
  };
}

/**
 * The mass each module takes on from the goods. A drawer's box and face go to its own module; a bay's panels to the
 * module in that bay. The countertop, and panels of bays with no module, are shared among the modules in proportion
 * to their bay's length, normalised over the bays that hold one: the total is kept and each module carries at least
 * its own share, so those members are checked high; members of empty bays are not checked for it (said in a note).
 */
export function goodsMassByModule(report: FrameReport, goods: SheetGoods): { byModule: Map<string, number>; notes: string[] } {
  const byModule = new Map<string, number>();
  const notes: string[] = [];
  const put = (id: string, kg: number) => byModule.set(id, (byModule.get(id) ?? 0) + kg);
  const moduleOfBay = new Map(report.modules.filter((m) => m.bay_id).map((m) => [m.bay_id as string, m.id]));
  const drawerModules = new Set(goods.drawers.map((d) => d.opening.module_id));
  let shared = 0;
  for (const p of goods.parts) {
    if (drawerModules.has(p.owner)) put(p.owner, p.mass_kg);
    else if (moduleOfBay.has(p.owner)) put(moduleOfBay.get(p.owner) as string, p.mass_kg);
    else shared += p.mass_kg;
  }
  const hosts = report.bays.filter((b) => moduleOfBay.has(b.id));
  const hostLength = hosts.reduce((a, b) => a + (b.end_mm - b.start_mm), 0);
  if (shared > 0 && hostLength > 0) {
    for (const b of hosts) put(moduleOfBay.get(b.id) as string, (shared * (b.end_mm - b.start_mm)) / hostLength);
    if (hosts.length < report.bays.length) {
      notes.push('The countertop and the panels of bays with no module are carried by the modules in the model; the members of bays with no module are not checked for them.');
    }
  } else if (shared > 0) {
    notes.push(`${massText(shared, report.units)} of panels and countertop sit on bays with no module: counted in the sheet goods’ mass, not in the member checks.`);
  }
  return { byModule, notes };
}

export type ReportWithGoods = { report: FrameReport; goods: SheetGoods | null };

/**
 * The report with the goods' mass and hardware folded in. The report is worked twice when the frame has bays: once
 * for the openings the goods are sized from, once with the modules carrying the goods' mass (the goods' sizes do not
 * depend on mass, so one pass each is enough).
 */
export function reportWithSheetGoods(doc: FrameDocument, ropts: ReportOptions = {}, gopts: SheetGoodsOptions = goodsOptionsOf(doc)): ReportWithGoods {
  const first = computeReport(doc, ropts);
  if (!first.bays.length) return { report: first, goods: null };
  let goods: SheetGoods;
  try {
    goods = sheetGoods(first, gopts);
  } catch (err) {
    if (err instanceof InputError) return { report: first, goods: null };
    throw err;
  }
  if (!goods.parts.length && !goods.hardware.length) return { report: first, goods };
  const { byModule, notes } = goodsMassByModule(first, goods);
  // Adds to the builder's module mass rather than replacing it: where that already held the box, loads come out
  // high, never low (the safe side).
  const heavier: FrameDocument = { ...doc, modules: doc.modules.map((m) => (byModule.has(m.id) ? { ...m, mass_kg: m.mass_kg + (byModule.get(m.id) as number) } : m)) };
  const report = computeReport(heavier, ropts);
  const lines = [...report.hardware.lines.filter((l) => !isGoodsLine(l)), ...goods.hardware.map((l) => toReportLine(l, report.hardware.spares_pct))];
  const goodsHardware_kg = lines.filter(isGoodsLine).reduce((a, l) => a + (l.count * l.unit_mass_g) / 1000, 0);
  return {
    goods: { ...goods, notes: [...goods.notes, ...notes] },
    report: {
      ...report,
      hardware: { ...report.hardware, lines, mass_kg: report.hardware.mass_kg + goodsHardware_kg },
      mass: { ...report.mass, hardware_kg: report.mass.hardware_kg + goodsHardware_kg, total_kg: report.mass.total_kg + goodsHardware_kg },
    },
  };
}
