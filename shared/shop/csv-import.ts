import Papa from 'papaparse';
import { InputError } from '../errors';
import { parseLength, type LengthOptions } from '../geometry/units';

export type CsvRowError = { line: number; reason: string };
export type CsvImport<T> = { rows: { line: number; value: T }[]; errors: CsvRowError[] };

/** A column: its header names (first is canonical; compared case- and space-insensitively) and whether it must be there. */
export type CsvColumn = { readonly key: string; readonly names: readonly string[]; readonly required: boolean };

export const MAX_IMPORT_ROWS = 5000;

const norm = (s: string): string => s.replace(/^\uFEFF/, '').trim().toLowerCase().replace(/[\s_()-]+/g, ' ').trim();

/** Undo our own export's formula escape ('=...) so a round trip reads back what was written. */
const unescapeCell = (s: string): string => (/^'[=+\-@\t\r]/.test(s) ? s.slice(1) : s).trim();

/**
 * Reads a CSV with a header row. Each data row becomes a record of the known columns, or an error with its line
 * number (1-based, counting the header and any line breaks inside quoted cells) and the reason. Good rows are kept
 * whatever happens to the bad ones. A missing required column is one error on line 1 and no rows.
 */
export function readCsv<T>(text: string, columns: readonly CsvColumn[], toValue: (cells: Record<string, string>) => T): CsvImport<T> {
  const rows: { line: number; value: T }[] = [];
  const errors: CsvRowError[] = [];
  const src = text.replace(/^\uFEFF/, '');
  const parsed = Papa.parse<string[]>(src, { skipEmptyLines: false });
  // Line number of each record: count the line breaks before the record starts.
  const lineStarts: number[] = [];
  {
    let line = 1;
    let inQuotes = false;
    let atRecordStart = true;
    for (let i = 0; i < src.length; i++) {
      if (atRecordStart) {
        lineStarts.push(line);
        atRecordStart = false;
      }
      const ch = src[i];
      if (ch === '"') inQuotes = !inQuotes;
      else if (ch === '\n') {
        line++;
        if (!inQuotes) atRecordStart = true;
      }
    }
  }
  const records = parsed.data;
  if (records.length === 0 || records[0].every((c) => c.trim() === '')) {
    return { rows, errors: [{ line: 1, reason: `no header row; expected columns: ${columns.map((c) => c.names[0]).join(', ')}` }] };
  }
  const header = records[0].map(norm);
  const index = new Map<string, number>();
  const missing: string[] = [];
  for (const col of columns) {
    const at = header.findIndex((h) => col.names.some((n) => norm(n) === h));
    if (at >= 0) index.set(col.key, at);
    else if (col.required) missing.push(col.names[0]);
  }
  if (missing.length) return { rows, errors: [{ line: 1, reason: `missing column${missing.length > 1 ? 's' : ''}: ${missing.join(', ')}` }] };
  for (let r = 1; r < records.length; r++) {
    const line = lineStarts[r] ?? r + 1;
    const cells = records[r];
    if (cells.every((c) => c.trim() === '')) continue;
    if (r > MAX_IMPORT_ROWS) {
      errors.push({ line, reason: `more than ${MAX_IMPORT_ROWS} rows; the rest was not read` });
      break;
    }
    const rec: Record<string, string> = {};
    for (const col of columns) {
      const at = index.get(col.key);
      rec[col.key] = at === undefined ? '' : unescapeCell(cells[at] ?? '');
    }
    try {
      rows.push({ line, value: toValue(rec) });
    } catch (err) {
      errors.push({ line, reason: err instanceof Error ? err.message : String(err) });
    }
  }
  return { rows, errors };
}

// ----- cell readers: each throws an InputError naming the column -----

export function requiredText(rec: Record<string, string>, key: string, max = 120): string {
  const v = rec[key] ?? '';
  if (v === '') throw new InputError(key, `${key}: empty`);
  if (v.length > max) throw new InputError(key, `${key}: longer than ${max} characters`);
  return v;
}

/** A length: bare numbers in `opts.bare` (millimetres unless told); units and shop notation accepted ("6 m", "47 1/4 in"). */
export function lengthCell(rec: Record<string, string>, key: string, opts: LengthOptions = {}): number {
  const mm = parseLength(requiredText(rec, key, 200), key, opts);
  if (!(mm > 0)) throw new InputError(key, `${key}: must be more than 0`);
  return Math.round(mm * 1000) / 1000;
}

export function positiveNumber(rec: Record<string, string>, key: string, opts: { integer?: boolean; optional?: boolean } = {}): number | undefined {
  const raw = rec[key] ?? '';
  if (raw === '') {
    if (opts.optional) return undefined;
    throw new InputError(key, `${key}: empty`);
  }
  const v = Number(raw.replace(/,/g, ''));
  if (!Number.isFinite(v)) throw new InputError(key, `${key}: "${raw}" is not a number`);
  if (!(v > 0)) throw new InputError(key, `${key}: must be more than 0`);
  if (opts.integer && !Number.isInteger(v)) throw new InputError(key, `${key}: must be a whole number`);
  return v;
}
