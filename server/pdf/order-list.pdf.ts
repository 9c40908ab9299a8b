import type { Content, TableCell } from 'pdfmake/interfaces';
import { lengthText, moneyText } from '@shared/shop/format';
import type { OrderMode } from '@shared/shop/order-list';
import type { OrderList, ShopMeta } from '@shared/shop/types';
import { facts, MUTED, rowsLayout, shopDocument } from './layout';
import { renderPdf } from './render';

export type OrderPdfInfo = {
  supplier: string | null;
  reference: string | null;
  mode: OrderMode;
  /** The copy mailed to the supplier: only the chosen way of buying, none of the shop's comparison. */
  forSupplier?: boolean;
};

/** The order list: stock bars by profile and length with cost, then the cut-to-length alternative (or the reverse). */
export async function orderListPdf(order: OrderList, meta: ShopMeta, info: OrderPdfInfo): Promise<Buffer> {
  const m = (v: number): string => moneyText(v, order.currency);
  const len = (mm: number): string => lengthText(mm, meta.units);
  const right = (t: string, bold = false): TableCell => ({ text: t, alignment: 'right', bold });
  const th = (cols: string[], rightFrom: number): TableCell[] => cols.map((t, i) => ({ text: t, style: 'th', alignment: i >= rightFrom ? 'right' : 'left' }));
  const content: Content[] = [
    facts([
      ['Supplier', info.supplier ?? '—'],
      ['Order', info.reference ?? 'draft'],
      ['Buying', info.mode === 'stock' ? 'Stock bars' : 'Parts cut to length'],
      ...(info.forSupplier
        ? [[info.mode === 'stock' ? 'Total' : 'Total with cutting fees', m(info.mode === 'stock' ? order.stockTotal : order.cutToLengthTotal)] as [string, string]]
        : ([
            ['Stock bars total', m(order.stockTotal)],
            ['Cut to length total', m(order.cutToLengthTotal)],
          ] as [string, string][])),
    ]),
  ];

  const stock: Content[] = [{ text: 'Stock bars', style: 'h2' }];
  {
    const body: TableCell[][] = [th(['Profile', 'Bar length', 'Qty', 'Unit price', 'Cost'], 2)];
    for (const p of order.profiles) {
      for (const l of p.order.stock.lines) {
        // Offcuts from the shop's own shelf are not bought: the supplier's copy leaves them out.
        if (info.forSupplier && l.onHand) continue;
        body.push([
          { text: [{ text: p.profileName, bold: true }, l.onHand ? { text: '  offcut on hand', color: MUTED, italics: true } : ''] },
          len(l.stockLength),
          right(String(l.qty), true),
          right(l.onHand ? '—' : m(l.unitPrice)),
          right(l.onHand ? '—' : m(l.cost)),
        ]);
      }
    }
    body.push([{ text: 'Bars to buy', bold: true }, '', right(String(order.barsToBuy), true), '', right(m(order.stockTotal), true)]);
    stock.push({ table: { headerRows: 1, widths: ['*', 90, 40, 80, 80], body, dontBreakRows: true }, layout: rowsLayout });
  }

  const cut: Content[] = [{ text: 'Cut to length by the supplier', style: 'h2' }];
  {
    const body: TableCell[][] = [th(['Profile', 'Length', 'Qty', 'Part marks', 'Cost'], 2)];
    for (const p of order.profiles) {
      for (const l of p.order.cutToLength.lines) {
        body.push([{ text: p.profileName, bold: true }, len(l.length), right(String(l.qty), true), { text: l.labels.join(', '), color: MUTED, alignment: 'right' }, right(m(l.cost))]);
      }
    }
    body.push([{ text: `${order.cutCount} cuts`, bold: true }, '', '', '', right(m(order.cutToLengthTotal), true)]);
    cut.push({ table: { headerRows: 1, widths: ['*', 90, 40, 80, 80], body, dontBreakRows: true }, layout: rowsLayout });
    const terms = order.profiles.map((p) => `${p.profileName}: ${m(p.order.cutToLength.pricePerMetre)} per metre`).join('; ');
    const fee = order.profiles[0]?.order.cutToLength.cutFee ?? 0;
    cut.push({ text: `Cost per part = length × price per metre + ${m(fee)} per cut. ${terms}.`, fontSize: 8.5, color: MUTED, margin: [0, 4, 0, 0] });
  }
  const [first, second] = info.mode === 'stock' ? [stock, cut] : [cut, stock];
  if (info.forSupplier) content.push(...first);
  else content.push(...first, { text: ' ', margin: [0, 6, 0, 0] }, ...second);
  content.push({ text: 'Prices as entered for the supplier; confirm with them before paying. Parts cut to length are within the supplier’s own tolerance.', color: MUTED, fontSize: 8.5, italics: true, margin: [0, 12, 0, 0] });
  return renderPdf(shopDocument('Order list', meta, content));
}
