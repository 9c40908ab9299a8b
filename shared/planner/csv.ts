// Pasted or uploaded lists for the quick planner: one row per line, fields separated by commas, semicolons or tabs,
// an optional header row. Parts: length, quantity, label. Stock: length, price, quantity (blank = as many as needed).
import { InputError } from '../errors';
import type { PartInput, StockInput } from './job';

function rows(text: string): { line: number; cells: string[] }[] {
  const out: { line: number; cells: string[] }[] = [];
  text.split(/\r?\n/).forEach((raw, i) => {
    const t = raw.trim();
    if (!t || t.startsWith('#')) return;
    out.push({ line: i + 1, cells: t.split(/[,;\t]/).map((c) => c.trim().replace(/^"(.*)"$/, '$1')) });
  });
  // A first row whose first cell is not a number is a header.
  if (out.length && !Number.isFinite(Number(out[0].cells[0]))) out.shift();
  return out;
}

function num(cell: string | undefined, field: string, line: number, opts: { integer?: boolean; positive?: boolean }): number {
  const v = Number(cell);
  if (cell === undefined || cell === '' || !Number.isFinite(v)) throw new InputError(`line ${line}`, `line ${line}: ${field} "${cell ?? ''}" is not a number`);
  if (opts.integer && !Number.isInteger(v)) throw new InputError(`line ${line}`, `line ${line}: ${field} must be a whole number (got ${v})`);
  if (opts.positive ? v <= 0 : v < 0) throw new InputError(`line ${line}`, `line ${line}: ${field} must be ${opts.positive ? 'positive' : 'zero or more'} (got ${v})`);
  return v;
}

export function parsePartsCsv(text: string): PartInput[] {
  const parts = rows(text).map(({ line, cells }) => ({
    length: num(cells[0], 'length', line, { positive: true }),
    qty: cells[1] === undefined || cells[1] === '' ? 1 : num(cells[1], 'quantity', line, { integer: true }),
    label: cells[2] || `L${line}`,
  }));
  if (parts.length === 0) throw new InputError('parts', 'parts: the list is empty');
  return parts;
}

export function parseStockCsv(text: string): StockInput[] {
  const stock = rows(text).map(({ line, cells }) => ({
    length: num(cells[0], 'length', line, { positive: true }),
    price: cells[1] === undefined || cells[1] === '' ? undefined : num(cells[1], 'price', line, {}),
    qty: cells[2] === undefined || cells[2] === '' ? null : num(cells[2], 'quantity', line, { integer: true }),
    ...(cells[3] ? { label: cells[3] } : {}),
  }));
  if (stock.length === 0) throw new InputError('stock', 'stock: the list is empty');
  return stock;
}
