import type { Content, TableCell } from 'pdfmake/interfaces';
import type { PickSheet } from '@shared/shop/pick-list';
import type { ShopMeta } from '@shared/shop/types';
import { checkbox, facts, INK, MUTED, rowsLayout, shopDocument } from './layout';
import { renderPdf } from './render';

/** The hardware pick list, with the slide-in T-nut warnings boxed at the top where they cannot be missed. */
export async function pickListPdf(sheet: PickSheet, meta: ShopMeta): Promise<Buffer> {
  const content: Content[] = [facts([['Lines', String(sheet.groups.reduce((n, g) => n + g.items.length, 0))], ['Pieces to pick', String(sheet.total)], ['Slide-in warnings', String(sheet.nutWarnings.length)]])];
  if (sheet.nutWarnings.length) {
    content.push({
      table: {
        widths: ['*'],
        body: [
          [{ text: 'T-NUTS TO SLIDE IN BEFORE CLOSING A SLOT', font: 'BarlowBold', fontSize: 11 }],
          [{ ul: sheet.nutWarnings.map((w) => (w.mark ? { text: [{ text: `${w.mark}: `, bold: true }, w.message] } : w.message)), fontSize: 10 }],
          [{ text: 'A forgotten slide-in nut means taking the frame apart: load a spare or two into slots you may want later.', fontSize: 8.5, color: MUTED }],
        ],
      },
      layout: { hLineWidth: (i: number, n: { table: { body: unknown[] } }) => (i === 0 || i === n.table.body.length ? 2 : 0), vLineWidth: () => 2, hLineColor: () => INK, vLineColor: () => INK, paddingTop: () => 5, paddingBottom: () => 5, paddingLeft: () => 8, paddingRight: () => 8 },
      margin: [0, 0, 0, 12],
    });
  }
  for (const g of sheet.groups) {
    content.push({ text: g.title, style: 'h3' });
    const body: TableCell[][] = [['', 'Item', 'Needed', 'Spares', 'Pick'].map((t, i) => ({ text: t, style: 'th', alignment: i >= 2 ? 'right' : 'left' }))];
    for (const h of g.items) {
      body.push([checkbox(12), { text: h.name, fontSize: 11 }, { text: String(h.qty), alignment: 'right' }, { text: h.spares ? `+${h.spares}` : '—', alignment: 'right', color: MUTED }, { text: String(h.toBuy), alignment: 'right', font: 'BarlowBold', fontSize: 13 }]);
    }
    content.push({ table: { headerRows: 1, widths: [14, '*', 50, 50, 50], body, dontBreakRows: true }, layout: rowsLayout, margin: [0, 0, 0, 8] });
  }
  content.push({ text: 'Counts come from the joints and module mounting points of the frame; spares are a margin for losses.', style: 'caution', margin: [0, 6, 0, 0] });
  return renderPdf(shopDocument('Hardware pick list', meta, content));
}
