import type { FrameReport } from '@shared/engine/report-types';
import { goodsOptionsOf, sheetStockOf } from '@shared/panels/goods-options';
import { sheetGoods } from '@shared/panels/sheet-goods';
import type { FrameDocument } from '@shared/model/frame-document';
import { planSheets, sheetJobsFromParts } from '@shared/sheets/index';
import type { SheetPlanMaterial } from '../../pdf';

/** A frame's sheet goods (drawers, faces, panels, countertop) planned per material on the builder's sheets. */
export function frameSheetPlans(doc: Pick<FrameDocument, 'goods' | 'units'>, report: FrameReport, timeLimitMs = 1500): (SheetPlanMaterial & { oversize: string[] })[] {
  // Sheet goods fill bays; a frame without a run of bays has none.
  if (!report.bays.length) return [];
  const goods = sheetGoods(report, goodsOptionsOf(doc));
  const stock = sheetStockOf(doc);
  return sheetJobsFromParts(goods.parts, stock).map((m) => ({
    material: m.material,
    thickness_mm: m.thickness_mm,
    kerf: stock.kerf,
    trim: stock.trim,
    plan: m.job.parts.length ? planSheets(m.job, { timeLimitMs }) : null,
    oversize: m.oversize,
  }));
}
