// A sheet-cutting job and its validation. Lengths in millimetres. A sheet's `length` runs along its grain (x),
// `width` across it (y). A part with `grain: true` keeps its length along the sheet's grain (never turned).
//
// Kerf and trim convention: a trim of `trim` comes off every edge of a sheet (squaring the factory edge), leaving
// (length − 2·trim) × (width − 2·trim) to nest in; parts side by side are one kerf apart.
import { z } from 'zod';
import { InputError } from '../errors';

const size = z.number().finite().min(1).max(10000);

export const sheetStockSchema = z.object({
  length: size,
  width: size,
  price: z.number().finite().min(0).max(1e6).optional(),
  /** Sheets on hand (offcuts), or absent/null for as many as needed. */
  qty: z.number().int().min(0).max(10000).nullable().optional(),
  label: z.string().max(120).optional(),
});

export const sheetPartSchema = z.object({
  length: size,
  width: size,
  qty: z.number().int().min(1).max(10000),
  label: z.string().max(120).default(''),
  grain: z.boolean().default(false),
});

export const sheetJobSchema = z.object({
  kerf: z.number().finite().min(0).max(20).default(0),
  trim: z.number().finite().min(0).max(200).default(0),
  sheets: z.array(sheetStockSchema).min(1).max(50),
  parts: z.array(sheetPartSchema).min(1).max(1000),
});

export type SheetJob = z.input<typeof sheetJobSchema>;
export type ValidSheetJob = z.output<typeof sheetJobSchema>;

/** Most parts one job may hold (after quantities): beyond this a plan would not finish in a user's patience. */
export const MAX_SHEET_ITEMS = 5000;

const mm = (v: number): string => `${Number(v.toFixed(2))} mm`;

/** Parse and check a job; throws InputError naming the field (and the part) at fault. */
export function validateSheetJob(input: unknown): ValidSheetJob {
  const parsed = sheetJobSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '') || 'job';
    let who = field;
    const [head, idx] = issue.path;
    if (head === 'parts' && typeof idx === 'number' && input && typeof input === 'object') {
      const part = (input as { parts?: { label?: unknown }[] }).parts?.[idx];
      if (part && typeof part.label === 'string' && part.label) who = `${field} (part '${part.label}')`;
    }
    throw new InputError(field, `${who}: ${issue.message}`);
  }
  const job = parsed.data;
  const total = job.parts.reduce((a, p) => a + p.qty, 0);
  if (total > MAX_SHEET_ITEMS) throw new InputError('parts', `parts: ${total} parts in all; at most ${MAX_SHEET_ITEMS} per job`);
  job.sheets.forEach((s, i) => {
    if (s.length - 2 * job.trim <= 0 || s.width - 2 * job.trim <= 0) {
      throw new InputError(`sheets[${i}]`, `sheets[${i}]: a trim of ${mm(job.trim)} on every edge leaves nothing of a ${mm(s.length)} × ${mm(s.width)} sheet`);
    }
  });
  if (job.sheets.every((s) => s.qty === 0)) throw new InputError('sheets', 'sheets: every sheet has qty 0');
  job.parts.forEach((p, i) => {
    const fits = job.sheets.some((s) => s.qty !== 0 && fitsSheet(p, s, job.trim));
    if (!fits) {
      const who = p.label ? `part '${p.label}'` : `part ${i + 1}`;
      throw new InputError(`parts[${i}]`, `parts[${i}]: ${who} (${mm(p.length)} × ${mm(p.width)}${p.grain ? ', with the grain' : ''}) does not fit any sheet after a ${mm(job.trim)} trim`);
    }
  });
  return job;
}

export function fitsSheet(p: { length: number; width: number; grain: boolean }, s: { length: number; width: number }, trim: number): boolean {
  const L = s.length - 2 * trim;
  const W = s.width - 2 * trim;
  return (p.length <= L && p.width <= W) || (!p.grain && p.width <= L && p.length <= W);
}
