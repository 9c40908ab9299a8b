export { drillListPdf } from './drill-list.pdf';
export { labelsPdf } from './labels.pdf';
export { orderListPdf, type OrderPdfInfo } from './order-list.pdf';
export { pickListPdf } from './pick-list.pdf';
export { sawListPdf } from './saw-list.pdf';
export { sheetPlanPdf, type SheetPlanMaterial } from './sheet-plan.pdf';
