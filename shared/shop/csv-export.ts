import Papa from 'papaparse';
import { lengthText, opShort } from './format';
import type { OrderList, ShopCutList, ShopUnits } from './types';

/**
 * Cells a spreadsheet would read as a formula: a leading = + - @, tab or carriage return (OWASP "CSV Injection"),
 * and their full-width forms, which some spreadsheets treat the same. Leading spaces do not make a cell safe.
 */
const FORMULA_START = /^[\s]*[=+\-@\t\r\uFF1D\uFF0B\uFF0D\uFF20]/;

export type CsvCell = string | number | null;

/**
 * CSV text (RFC 4180, CRLF) with formula-looking text cells prefixed by a single quote and quoted, as OWASP advises;
 * numbers are written as numbers (a negative number is data, not a formula). Starts with a byte-order mark so
 * spreadsheets read the UTF-8 (×, ±, Ø) correctly.
 */
export function toCsv(rows: readonly (readonly CsvCell[])[]): string {
  return '\uFEFF' + Papa.unparse(rows as CsvCell[][], { escapeFormulae: FORMULA_START, newline: '\r\n' }) + '\r\n';
}

/** The cut list grouped by profile and part mark: one row per mark. */
export function cutListCsv(cutList: ShopCutList, units: ShopUnits): string {
  const rows: CsvCell[][] = [['Profile', 'Part mark', 'Quantity', 'Cut length (mm)', 'Cut length', 'Tolerance (± mm)', 'Machining', 'Members']];
  for (const p of cutList.parts) {
    rows.push([
      p.profileName,
      p.mark,
      p.qty,
      p.cutLength_mm,
      lengthText(p.cutLength_mm, units),
      p.tolerance_mm,
      p.ops.map((op) => opShort(op, units)).join('; '),
      p.members.join('; '),
    ]);
  }
  return toCsv(rows);
}

/** The order list: stock bars (and shelf offcuts used), then the cut-to-length alternative. Lengths in mm for
 * sorting and sums, and as the shop reads them. */
export function orderListCsv(order: OrderList, units: ShopUnits): string {
  const c = order.currency;
  const rows: CsvCell[][] = [['Buy as', 'Profile', 'Length (mm)', 'Length', 'Quantity', `Unit price (${c})`, `Cost (${c})`, 'Part marks']];
  for (const p of order.profiles) {
    for (const l of p.order.stock.lines) rows.push([l.onHand ? 'offcut on hand' : 'stock bar', p.profileName, l.stockLength, lengthText(l.stockLength, units), l.qty, l.unitPrice, l.cost, '']);
  }
  for (const p of order.profiles) {
    for (const l of p.order.cutToLength.lines) rows.push(['cut to length', p.profileName, l.length, lengthText(l.length, units), l.qty, null, l.cost, l.labels.join(' ')]);
  }
  rows.push(['total stock bars', '', null, '', order.barsToBuy, null, order.stockTotal, '']);
  rows.push(['total cut to length', '', null, '', order.cutCount, null, order.cutToLengthTotal, '']);
  return toCsv(rows);
}
