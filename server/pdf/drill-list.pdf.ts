import type { Content, TableCell } from 'pdfmake/interfaces';
import type { DrillSheet } from '@shared/shop/drill-list';
import type { ShopMeta } from '@shared/shop/types';
import { checkbox, facts, MUTED, rowsLayout, shopDocument } from './layout';
import { renderPdf } from './render';

const CAUTION = 'Clamp the work before drilling; wear eye protection; use cutting fluid for aluminium and clear the chips.';

/** Machining after the saw: end taps and access holes per part mark. */
export async function drillListPdf(sheet: DrillSheet, meta: ShopMeta): Promise<Buffer> {
  const content: Content[] = [facts([['Parts to machine', String(sheet.rows.reduce((n, r) => n + r.qty, 0))], ...sheet.totals.map((t): [string, string] => [t.what, `${t.count}`])])];
  if (sheet.rows.length === 0) {
    content.push({ text: 'No part of this frame needs drilling or tapping.', margin: [0, 12, 0, 0] });
  } else {
    const body: TableCell[][] = [['', 'Mark', 'Qty', 'Length', 'Profile', 'Steps (per piece)'].map((t) => ({ text: t, style: 'th' }))];
    for (const r of sheet.rows) {
      body.push([
        checkbox(12),
        { text: r.mark, font: 'BarlowBold', fontSize: 14 },
        { text: `× ${r.qty}`, bold: true, fontSize: 11 },
        { text: r.lengthText, bold: true },
        { text: [r.profileName, { text: r.members.length ? `\n${r.members.join(', ')}` : '', style: 'muted' }] },
        { ul: r.steps, fontSize: 9.5 },
      ]);
    }
    content.push({ table: { headerRows: 1, widths: [14, 34, 30, 64, 90, '*'], body, dontBreakRows: true }, layout: rowsLayout });
  }
  content.push({ text: `Positions are measured from the piece's start end (the end listed first on the saw list). ${CAUTION}`, fontSize: 8.5, color: MUTED, italics: true, margin: [0, 10, 0, 0] });
  return renderPdf(shopDocument('Drill and tap list', meta, content));
}
