import type { Content, TableCell } from 'pdfmake/interfaces';
import type { PartLabel } from '@shared/shop/labels';
import type { ShopMeta } from '@shared/shop/types';
import { contentWidth, MUTED, RULE, shopDocument } from './layout';
import { renderPdf } from './render';

const COLS = 3;
const LABEL_H = 92;

function label(l: PartLabel): TableCell {
  return {
    stack: [
      { columns: [{ text: l.mark, font: 'BarlowBold', fontSize: 30, width: 'auto' }, { text: `${l.piece}/${l.of}`, alignment: 'right', color: MUTED, fontSize: 9, margin: [0, 4, 0, 0] }] },
      { text: l.lengthText, font: 'BarlowBold', fontSize: 14 },
      { text: l.profileName, fontSize: 9 },
      { text: l.ops || ' ', fontSize: 8, color: MUTED },
      { text: `${l.project} · ${l.frame}`, fontSize: 7, color: MUTED, margin: [0, 2, 0, 0] },
    ],
  };
}

/** A sheet of part labels, three across, cut apart along the grey lines (or printed on label stock). */
export async function labelsPdf(labels: PartLabel[], meta: ShopMeta): Promise<Buffer> {
  const rows: TableCell[][] = [];
  for (let i = 0; i < labels.length; i += COLS) {
    const row: TableCell[] = labels.slice(i, i + COLS).map(label);
    while (row.length < COLS) row.push({ text: '' });
    rows.push(row);
  }
  const w = contentWidth(meta.paper) / COLS;
  const content: Content[] = rows.length
    ? [
        {
          table: { widths: Array(COLS).fill(w - 16), heights: LABEL_H, body: rows, dontBreakRows: true },
          layout: { hLineWidth: () => 0.5, vLineWidth: () => 0.5, hLineColor: () => RULE, vLineColor: () => RULE, paddingLeft: () => 8, paddingRight: () => 8, paddingTop: () => 6, paddingBottom: () => 4 },
        },
      ]
    : [{ text: 'This frame has no parts to label.' }];
  return renderPdf(shopDocument('Part labels', meta, content));
}
