import type { Content, TableCell } from 'pdfmake/interfaces';
import type { PickSheet } from '@shared/shop/pick-list';
import type { ShopMeta } from '@shared/shop/types';
import { checkbox, facts, INK, MUTED, rowsLayout, shopDocument } from './layout';
import { renderPdf } from './render';

/** The hardware pick list, with the slide-in T-nut warnings boxed at the top where they cannot be missed. */
export async function pickListPdf(sheet: PickSheet, meta: ShopMeta): Promise<Buffer> {
  const content: Content[] = [facts([['Lines', String(sheet.groups.reduce((n, g) => n + g.items.length, 0))], ['Pieces to pick', String(sheet.total)], ['Slide-in warnings', String(sheet.nutWarnings.length)]])];
  if (sheet.nutWarnings.length) {
    const nuts = sheet.nutWarnings.reduce((n, w) => n + (w.count ?? 0), 0);
    content.push({
      table: { widths: ['*'], body: [[{ text: [{ text: `${sheet.nutWarnings.length} slots need slide-in T-nuts before they are closed`, font: 'BarlowBold' }, nuts ? ` (${nuts} nuts, counted in the T-nuts below).` : '.', ' The list after the hardware says which, and before fitting what.'] }]] },
      layout: { hLineWidth: () => 1.5, vLineWidth: () => 1.5, paddingTop: () => 6, paddingBottom: () => 6, paddingLeft: () => 8, paddingRight: () => 8 },
      margin: [0, 0, 0, 10],
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
  if (sheet.nutWarnings.length) {
    const structured = sheet.nutWarnings.every((w) => w.member !== undefined && w.count !== undefined);
    const body: TableCell[][] = structured
      ? [
          ['', 'Mark', 'Member', 'Face, slot', 'Nuts', 'Slide in before fitting'].map((t) => ({ text: t, style: 'th' })),
          ...sheet.nutWarnings.map((w): TableCell[] => [
            checkbox(11),
            { text: w.mark ?? '', font: 'BarlowBold', fontSize: 11 },
            { text: w.member ?? '', fontSize: 9 },
            { text: `${w.face} ${w.slot}`, fontSize: 9 },
            { text: String(w.count), bold: true, fontSize: 11, alignment: 'right' },
            { text: (w.closedBy ?? []).join(' and '), fontSize: 9 },
          ]),
        ]
      : [['', { text: 'Warning', style: 'th' }], ...sheet.nutWarnings.map((w): TableCell[] => [checkbox(11), { text: w.mark ? [{ text: `${w.mark}: `, bold: true }, w.message] : w.message, fontSize: 9.5 }])];
    content.push(
      { text: 'T-NUTS TO SLIDE IN BEFORE CLOSING A SLOT', font: 'BarlowBold', fontSize: 12, margin: [0, 10, 0, 2] },
      {
        text: 'A slide-in nut enters from an open slot end. Once both ends are closed by the members listed, a forgotten nut means taking the frame apart (or using a drop-in nut). Load a spare or two into slots you may want later.',
        fontSize: 8.5,
        color: MUTED,
        margin: [0, 0, 0, 4],
      },
      {
        table: { headerRows: 1, dontBreakRows: true, widths: structured ? [14, 30, '*', 60, 30, '*'] : [14, '*'], body },
        layout: rowsLayout,
        margin: [0, 0, 0, 12],
      },
    );
  }
  content.push({ text: 'Counts come from the joints and module mounting points of the frame; spares are a margin for losses.', style: 'caution', margin: [0, 6, 0, 0] });
  return renderPdf(shopDocument('Hardware pick list', meta, content));
}
