import type { Content, TableCell } from 'pdfmake/interfaces';
import { lengthText, moneyText } from '@shared/shop/format';
import type { OrderList, ShopMeta } from '@shared/shop/types';
import { facts, MUTED, rowsLayout, shopDocument } from './layout';
import { renderPdf } from './render';

export type OrderPdfInfo = { supplier: string | null; reference: string | null; mode: 'stock' | 'cut-to-length' };

/** The order list: stock bars by profile and length with cost, then the cut-to-length alternative. */
export async function orderListPdf(order: OrderList, meta: ShopMeta, info: OrderPdfInfo): Promise<Buffer> {
  const m = (v: number | null): string => (v === null ? '—' : moneyText(v, order.currency));
  const len = (mm: number): string => lengthText(mm, meta.units);
  const right = (t: string, bold = false): TableCell => ({ text: t, alignment: 'right', bold });
  const chosen = info.mode === 'stock' ? 'Stock bars' : 'Parts cut to length';
  const content: Content[] = [
    facts([
      ['Supplier', info.supplier ?? '—'],
      ['Order', info.reference ?? 'draft'],
      ['Buying', chosen],
      ['Stock bars total', m(order.stockTotal)],
      ['Cut to length total', m(order.cutToLengthTotal)],
    ]),
  ];
  const stock: Content[] = [{ text: 'Stock bars', style: 'h2' }];
  if (order.stock.length === 0) stock.push({ text: 'No bars to buy: everything comes from offcuts on the shelf.' });
  else {
    const body: TableCell[][] = [['Profile', 'Bar length', 'Qty', 'Unit price', 'Cost'].map((t, i) => ({ text: t, style: 'th', alignment: i >= 2 ? 'right' : 'left' }))];
    for (const l of order.stock) body.push([{ text: l.profileName, bold: true }, len(l.length_mm), right(String(l.qty), true), right(m(l.unitPrice)), right(m(l.cost))]);
    body.push([{ text: 'Total', bold: true }, '', right(String(order.stock.reduce((n, l) => n + l.qty, 0)), true), '', right(m(order.stockTotal), true)]);
    stock.push({ table: { headerRows: 1, widths: ['*', 90, 40, 80, 80], body }, layout: rowsLayout });
  }
  const cut: Content[] = [{ text: 'Cut to length by the supplier', style: 'h2', margin: [0, 14, 0, 4] }];
  {
    const body: TableCell[][] = [['Profile', 'Length', 'Qty', 'Part marks'].map((t, i) => ({ text: t, style: 'th', alignment: i === 2 ? 'right' : 'left' }))];
    for (const l of order.cutToLength) body.push([{ text: l.profileName, bold: true }, len(l.length_mm), right(String(l.qty), true), { text: l.marks.join(', '), color: MUTED }]);
    cut.push({ table: { headerRows: 1, widths: ['*', 90, 40, 120], body, dontBreakRows: true }, layout: rowsLayout });
    const mBody: TableCell[][] = [['Profile', 'Metres', 'Per metre', 'Material'].map((t, i) => ({ text: t, style: 'th', alignment: i >= 1 ? 'right' : 'left' }))];
    for (const l of order.cutToLengthMetres) mBody.push([l.profileName, right(l.metres.toFixed(3)), right(m(l.pricePerMetre)), right(m(l.cost))]);
    mBody.push([`${order.cutCount} cuts at ${m(order.feePerCut)}`, '', '', right(order.feePerCut === null ? '—' : m(Math.round(order.feePerCut * order.cutCount * 100) / 100))]);
    mBody.push([{ text: 'Total', bold: true }, '', '', right(m(order.cutToLengthTotal), true)]);
    cut.push({ table: { headerRows: 1, widths: ['*', 70, 80, 80], body: mBody }, layout: rowsLayout, margin: [0, 8, 0, 0] });
  }
  content.push(...(info.mode === 'stock' ? [...stock, ...cut] : [...cut, ...stock]));
  content.push({ text: 'Prices as entered for the supplier; confirm with them before paying. Lengths within the supplier’s cutting tolerance.', color: MUTED, fontSize: 8.5, italics: true, margin: [0, 12, 0, 0] });
  return renderPdf(shopDocument('Order list', meta, content));
}
