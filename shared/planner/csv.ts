// Pasted or uploaded lists for the quick planner: one row per line, fields separated by commas, semicolons or tabs
// (semicolons or tabs only where a comma is the decimal mark), an optional header row. Parts: length, quantity,
// label. Stock: length, price, quantity (blank = as many as needed). Lengths go through the one length reader, so
// "47 1/4 in" or "1,2 m" work, and a bare number is in the unit on screen.
import { InputError } from '../errors';
import { parseLength, type LengthOptions } from '../geometry/units';
import type { PartInput, StockInput } from './job';

function rows(text: string, opts: LengthOptions): { line: number; cells: string[] }[] {
  const out: { line: number; cells: string[] }[] = [];
  const sep = opts.decimalComma ? /[;\t]/ : /[,;\t]/;
  text.split(/\r?\n/).forEach((raw, i) => {
    const t = raw.trim();
    if (!t || t.startsWith('#')) return;
    out.push({ line: i + 1, cells: t.split(sep).map((c) => c.trim().replace(/^"(.*)"$/, '$1')) });
  });
  // A first row whose first cell is not a length is a header.
  if (out.length && !readsAsLength(out[0].cells[0], opts)) out.shift();
  return out;
}

function readsAsLength(cell: string | undefined, opts: LengthOptions): boolean {
  try {
    parseLength(cell ?? '', 'length', opts);
    return true;
  } catch {
    return false;
  }
}

function length(cell: string | undefined, line: number, opts: LengthOptions): number {
  let v: number;
  try {
    v = parseLength(cell ?? '', 'length', opts);
  } catch (e) {
    throw new InputError(`line ${line}`, `line ${line}: ${e instanceof Error ? e.message : String(e)}`);
  }
  if (!(v > 0)) throw new InputError(`line ${line}`, `line ${line}: length must be positive (got ${v})`);
  return Math.round(v * 1000) / 1000;
}

function num(cell: string | undefined, field: string, line: number, opts: { integer?: boolean; positive?: boolean }): number {
  const v = Number(cell);
  if (cell === undefined || cell === '' || !Number.isFinite(v)) throw new InputError(`line ${line}`, `line ${line}: ${field} "${cell ?? ''}" is not a number`);
  if (opts.integer && !Number.isInteger(v)) throw new InputError(`line ${line}`, `line ${line}: ${field} must be a whole number (got ${v})`);
  if (opts.positive ? v <= 0 : v < 0) throw new InputError(`line ${line}`, `line ${line}: ${field} must be ${opts.positive ? 'positive' : 'zero or more'} (got ${v})`);
  return v;
}

export function parsePartsCsv(text: string, opts: LengthOptions = {}): PartInput[] {
  const parts = rows(text, opts).map(({ line, cells }) => ({
    length: length(cells[0], line, opts),
    qty: cells[1] === undefined || cells[1] === '' ? 1 : num(cells[1], 'quantity', line, { integer: true }),
    label: cells[2] || `L${line}`,
  }));
  if (parts.length === 0) throw new InputError('parts', 'parts: the list is empty');
  return parts;
}

export function parseStockCsv(text: string, opts: LengthOptions = {}): StockInput[] {
  const stock = rows(text, opts).map(({ line, cells }) => ({
    length: length(cells[0], line, opts),
    price: cells[1] === undefined || cells[1] === '' ? undefined : num(opts.decimalComma ? cells[1].replace(',', '.') : cells[1], 'price', line, {}),
    qty: cells[2] === undefined || cells[2] === '' ? null : num(cells[2], 'quantity', line, { integer: true }),
    ...(cells[3] ? { label: cells[3] } : {}),
  }));
  if (stock.length === 0) throw new InputError('stock', 'stock: the list is empty');
  return stock;
}
