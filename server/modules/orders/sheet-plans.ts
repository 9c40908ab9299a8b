import type { FrameReport } from '@shared/engine/report-types';
import { sheetGoods } from '@shared/panels/sheet-goods';
import { DEFAULT_SHEET_KERF, DEFAULT_SHEET_TRIM, planSheets, sheetJobsFromParts } from '@shared/sheets/index';
import type { SheetPlanMaterial } from '../../pdf';

/** A frame's sheet goods (drawers, faces, panels, countertop) planned per material on standard sheets. */
export function frameSheetPlans(report: FrameReport, timeLimitMs = 1500): (SheetPlanMaterial & { oversize: string[] })[] {
  // Sheet goods fill bays; a frame without a run of bays has none.
  if (!report.bays.length) return [];
  const goods = sheetGoods(report);
  return sheetJobsFromParts(goods.parts).map((m) => ({
    material: m.material,
    thickness_mm: m.thickness_mm,
    kerf: DEFAULT_SHEET_KERF,
    trim: DEFAULT_SHEET_TRIM,
    plan: m.job.parts.length ? planSheets(m.job, { timeLimitMs }) : null,
    oversize: m.oversize,
  }));
}
