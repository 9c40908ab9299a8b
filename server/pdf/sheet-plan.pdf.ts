import type { CanvasElement, Content, TableCell } from 'pdfmake/interfaces';
import { formatLength } from '@shared/geometry/units';
import type { PlannedSheet, SheetPlan } from '@shared/sheets/plan';
import type { ShopMeta } from '@shared/shop/types';
import { contentWidth, facts, FILL, INK, MUTED, rowsLayout, shopDocument } from './layout';
import { renderPdf } from './render';

const SHEET_CAUTION =
  'Track and panel saws: wear eye and hearing protection and a dust mask, support both sides of every cut, keep the cord clear and follow the saw maker’s instructions.';

/** `plan` is null when every part of the material is larger than the sheet; those are listed in `oversize`. */
export type SheetPlanMaterial = { material: string; thickness_mm: number; kerf: number; trim: number; plan: SheetPlan | null; oversize?: string[] };

/** The sheet drawn to scale: trim strips grey, parts light grey with their cut number marks, cuts as heavy lines numbered in order. */
function diagram(s: PlannedSheet, width: number): Content {
  const k = width / s.length;
  const h = s.width * k;
  const shapes: CanvasElement[] = [{ type: 'rect', x: 0, y: 0, w: width, h, color: '#FFFFFF', lineColor: INK, lineWidth: 1.1 }];
  const labels: Content[] = [];
  // y grows down the page; the sheet's y grows up from its near (bottom) edge, as a builder lays it on the trestles.
  const py = (y: number): number => h - y * k;
  s.placements.forEach((p) => {
    const dx = (p.rotated ? p.width : p.length) * k;
    const dy = (p.rotated ? p.length : p.width) * k;
    shapes.push({ type: 'rect', x: p.x * k, y: py(p.y) - dy, w: dx, h: dy, color: FILL, lineColor: MUTED, lineWidth: 0.5 });
    if (dx > 24 && dy > 9) {
      labels.push({ text: p.label, fontSize: dy > 20 && dx > 60 ? 7.5 : 6, width: dx - 4, alignment: 'center', relativePosition: { x: p.x * k + 2, y: -h + py(p.y) - dy / 2 - 4 } } as Content);
    }
  });
  s.cuts.forEach((c, i) => {
    shapes.push({ type: 'line', x1: c.x1 * k, y1: py(c.y1), x2: c.x2 * k, y2: py(c.y2), lineWidth: c.kind === 'trim' ? 0.6 : 1.2, lineColor: INK, ...(c.kind === 'trim' ? { dash: { length: 2 } } : {}) });
    if (c.kind === 'cut') {
      labels.push({ text: String(i + 1), fontSize: 6, bold: true, color: INK, relativePosition: { x: c.x1 * k + 1, y: -h + py(c.y1) - 7 } } as Content);
    }
  });
  return { stack: [{ canvas: shapes }, ...labels.map((l) => ({ columns: [l] }) as Content)], margin: [0, 4, 0, 8] };
}

function cutRows(s: PlannedSheet, units: ShopMeta['units']): TableCell[][] {
  const len = (v: number): string => formatLength(v, units.display, units.frac);
  return s.cuts.map((c, i) => {
    const along = Math.abs(c.y1 - c.y2) < 1e-6;
    const what = c.kind === 'trim' ? 'trim' : along ? 'along the length' : 'across';
    const at = along ? `${len(c.y1)} from the near edge` : `${len(c.x1)} from the left end`;
    const span = along ? `${len(c.x1)} to ${len(c.x2)}` : `${len(c.y1)} to ${len(c.y2)}`;
    return [String(i + 1), String(c.stage), what, at, span];
  });
}

function partRows(s: PlannedSheet, units: ShopMeta['units']): TableCell[][] {
  const len = (v: number): string => formatLength(v, units.display, units.frac);
  const by = new Map<string, { label: string; size: string; turned: boolean; n: number }>();
  for (const p of s.placements) {
    const key = `${p.label}|${p.length}|${p.width}|${p.rotated}`;
    const e = by.get(key) ?? { label: p.label, size: `${len(p.length)} × ${len(p.width)}`, turned: p.rotated, n: 0 };
    e.n++;
    by.set(key, e);
  }
  return [...by.values()].map((e) => [{ text: e.label, bold: true }, e.size, e.turned ? 'turned (no grain)' : 'grain along the sheet', String(e.n)]);
}

/** The printed sheet plan: per material, a diagram of each sheet, its cuts in order (stage by stage) and its parts. */
export async function sheetPlanPdf(materials: SheetPlanMaterial[], meta: ShopMeta): Promise<Buffer> {
  const width = contentWidth(meta.paper);
  const len = (v: number): string => formatLength(v, meta.units.display, meta.units.frac);
  const content: Content[] = [];
  if (!materials.length) content.push({ text: 'This frame has no drawers, faces, panels or countertop to cut from sheets.', margin: [0, 10, 0, 0] });
  materials.forEach((m, mi) => {
    const count = m.plan?.sheetCount ?? 0;
    content.push({ text: [{ text: m.material }, { text: `   ${count} sheet${count === 1 ? '' : 's'}`, font: 'Barlow', fontSize: 10, color: MUTED }], style: 'h2', pageBreak: mi > 0 ? 'before' : undefined });
    if (m.oversize?.length) {
      content.push({ text: `Larger than the sheet, not planned (join two pieces, or buy them whole): ${m.oversize.join('; ')}.`, bold: true, margin: [0, 0, 0, 6] });
    }
    if (!m.plan) return;
    const plan = m.plan;
    content.push(
      facts([
        ['Kerf', len(m.kerf)],
        ['Trim', len(m.trim)],
        ['Sheets', String(plan.sheetCount)],
        ['Lower bound', String(plan.lowerBound)],
        ['Waste', `${plan.waste_pct.toFixed(1)} %`],
      ]),
    );
    content.push({
      text: 'Trim the factory edges first (dashed lines). Then make the cuts in number order: each runs from edge to edge of the piece it is made on, stage by stage. Positions are to the line; the blade takes its kerf on the far side.',
      style: 'caution',
      margin: [0, 0, 0, 4],
    });
    plan.sheets.forEach((s, si) => {
      content.push({
        stack: [
          { text: [{ text: `Sheet ${si + 1} of ${plan.sheetCount}`, font: 'BarlowBold', fontSize: 12 }, { text: `   ${len(s.length)} × ${len(s.width)}${s.label ? ` · ${s.label}` : ''} · ${s.used_pct.toFixed(0)} % used`, color: MUTED }], margin: [0, 6, 0, 0] },
          diagram(s, width),
        ],
        unbreakable: true,
      });
      content.push({
        table: { headerRows: 1, widths: [18, 30, 80, '*', '*'], body: [['#', 'Stage', 'Cut', 'Set the track', 'Runs'].map((t) => ({ text: t, style: 'th' })), ...cutRows(s, meta.units)] },
        layout: rowsLayout,
        fontSize: 8.5,
        margin: [0, 0, 0, 6],
      });
      content.push({
        table: { headerRows: 1, widths: ['*', 120, 110, 30], body: [['Part', 'Size', 'Lies', 'Qty'].map((t) => ({ text: t, style: 'th' })), ...partRows(s, meta.units)] },
        layout: rowsLayout,
        fontSize: 8.5,
        margin: [0, 0, 0, 10],
      });
    });
  });
  content.push({ text: SHEET_CAUTION, style: 'caution', color: MUTED, margin: [0, 8, 0, 0] });
  return renderPdf(shopDocument('Sheet plan', meta, content, { caution: 'Tick each part off as it comes off the sheet.' }));
}
