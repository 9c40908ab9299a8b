import type { CutSessionPlan } from '@shared/api/shop';
import { reportWithSheetGoods } from '@shared/panels/report-with-goods';
import { InputError } from '@shared/errors';
import { parseFrameDocument } from '@shared/model/parse';
import { cutListCsv, orderListCsv } from '@shared/shop/csv-export';
import { drillSheet } from '@shared/shop/drill-list';
import { shopCutList } from '@shared/shop/from-report';
import { partLabels } from '@shared/shop/labels';
import { orderList } from '@shared/shop/order-list';
import { pickSheet } from '@shared/shop/pick-list';
import { sawSheet } from '@shared/shop/saw-list';
import { ensureMipSolver } from '../modules/orders/mip';
import { planShop, type ShelfOffcut, type StockOffer } from '@shared/shop/shop-plan';
import type { ShopMeta, ShopUnits } from '@shared/shop/types';
import { drillListPdf, labelsPdf, pickListPdf, sawListPdf, sheetPlanPdf } from '../pdf';
import { frameSheetPlans } from '../modules/orders/sheet-plans';

// One shop document of a frame from what the database gave: the report, the plan when one is needed, and the
// PDF or CSV. Runs in a worker thread; everything in and out is plain data.

export const SHOP_DOCS = ['saw-list.pdf', 'drill-list.pdf', 'pick-list.pdf', 'labels.pdf', 'cut-list.csv', 'order-list.csv', 'sheet-plan.pdf'] as const;
export type ShopDoc = (typeof SHOP_DOCS)[number];

export interface ShopDocumentInput {
  doc: ShopDoc;
  document: unknown;
  meta: Omit<ShopMeta, 'units'> & { units?: ShopUnits };
  /** The plan frozen when cutting started on this revision (saw list only). */
  frozen: CutSessionPlan | null;
  offers: StockOffer[];
  shelf: ShelfOffcut[];
  /** Asked for this document; left out, the frame's own trim and shortest offcut apply. */
  settings: { trim_mm?: number; minOffcut_mm?: number };
  timeLimitMs: number;
  currency: string;
  cutFee: number;
}

export interface ShopDocumentOutput {
  body: Uint8Array | string;
  contentType: string;
  /** The end of the file name after `<frame>-r<version>-`. */
  suffix: string;
}

/** Whether this document needs the stock planner (and so the supplier and the shelf). */
export function needsPlan(doc: ShopDoc, frozen: boolean): boolean {
  return (doc === 'saw-list.pdf' && !frozen) || doc === 'order-list.csv';
}

const PDF = 'application/pdf';
const CSV = 'text/csv; charset=utf-8';

export async function shopDocument(input: ShopDocumentInput): Promise<ShopDocumentOutput> {
  const frame = parseFrameDocument(input.document);
  const report = reportWithSheetGoods(frame).report;
  const meta: ShopMeta = { ...input.meta, units: { ...report.units, ...input.meta.units } };
  const { doc, frozen } = input;
  let planned = null;
  if (needsPlan(doc, frozen !== null)) {
    if (report.cut_list.length === 0) throw new InputError('frame', 'This frame has no members to cut yet');
    const settings = { trim_mm: input.settings.trim_mm ?? report.settings.trim_mm, minOffcut_mm: input.settings.minOffcut_mm ?? report.settings.min_offcut_mm };
    await ensureMipSolver();
    planned = await planShop(report, input.offers, input.shelf, settings, input.timeLimitMs);
  }
  const cutList = frozen?.cutList ?? planned?.cutList ?? shopCutList(report);
  switch (doc) {
    case 'saw-list.pdf':
      return { body: await sawListPdf(sawSheet(cutList, frozen?.plans ?? planned!.plans, meta)), contentType: PDF, suffix: 'saw-list.pdf' };
    case 'drill-list.pdf':
      return { body: await drillListPdf(drillSheet(cutList, meta.units), meta), contentType: PDF, suffix: 'drill-list.pdf' };
    case 'pick-list.pdf':
      return { body: await pickListPdf(pickSheet(cutList), meta), contentType: PDF, suffix: 'pick-list.pdf' };
    case 'labels.pdf':
      return { body: await labelsPdf(partLabels(cutList, meta), meta), contentType: PDF, suffix: 'labels.pdf' };
    case 'cut-list.csv':
      return { body: cutListCsv(cutList, meta.units), contentType: CSV, suffix: 'cut-list.csv' };
    case 'order-list.csv':
      return { body: orderListCsv(orderList(planned!.planned, input.currency, { cutFee: input.cutFee }, meta.units), meta.units), contentType: CSV, suffix: 'order-list.csv' };
    case 'sheet-plan.pdf':
      return { body: await sheetPlanPdf(frameSheetPlans(frame, report), meta), contentType: PDF, suffix: 'sheet-plan.pdf' };
  }
}
