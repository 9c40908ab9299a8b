// The cutting job for one profile, and its validation. Lengths in millimetres.
//
// Kerf convention: on each bar, trim + Σ parts + (parts − 1) × kerf ≤ bar length. The leftover after the last part is
// separated by one more kerf if it is kept; a kept leftover of at least `minOffcut` is a reusable offcut, anything
// shorter is waste.
import { z } from 'zod';
import { InputError } from '../errors';

const length = z.number().finite();

export const stockSchema = z.object({
  length: length,
  price: z.number().finite().min(0).optional(),
  /** Bars available (offcuts on the shelf), or null/absent for as many as needed. */
  qty: z.number().int().min(0).nullable().optional(),
  label: z.string().max(200).optional(),
});

export const partSchema = z.object({
  length: length,
  qty: z.number().int().min(0),
  label: z.string().max(200).default(''),
});

export const cutJobSchema = z.object({
  kerf: z.number().finite().min(0).default(0),
  trim: z.number().finite().min(0).default(0),
  minOffcut: z.number().finite().min(0).default(0),
  stock: z.array(stockSchema).min(1),
  parts: z.array(partSchema).min(1),
});

export type StockInput = z.input<typeof stockSchema>;
export type PartInput = z.input<typeof partSchema>;
export type CutJob = z.input<typeof cutJobSchema>;
export type ValidCutJob = z.output<typeof cutJobSchema>;

const partName = (p: { label?: string; length: number }, i: number): string =>
  p.label ? `part '${p.label}'` : `part ${i + 1}`;
const mm = (v: number): string => `${Number(v.toFixed(3))} mm`;

/** Parse and check a job; throws InputError naming the field (and the part) at fault. */
export function validateCutJob(input: unknown): ValidCutJob {
  const parsed = cutJobSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '');
    let who = field || 'job';
    const [head, idx] = issue.path;
    if (head === 'parts' && typeof idx === 'number' && input && typeof input === 'object') {
      const part = (input as { parts?: { label?: unknown }[] }).parts?.[idx];
      if (part && typeof part.label === 'string' && part.label) who = `${field} (part '${part.label}')`;
    }
    throw new InputError(field || 'job', `${who}: ${issue.message}`);
  }
  const job = parsed.data;
  job.stock.forEach((s, i) => {
    if (s.length <= 0) throw new InputError(`stock[${i}].length`, `stock[${i}].length: stock length must be positive (got ${s.length})`);
    if (job.kerf >= s.length) {
      throw new InputError('kerf', `kerf: the kerf (${mm(job.kerf)}) must be shorter than every stock bar (stock[${i}] is ${mm(s.length)})`);
    }
    if (job.trim >= s.length) {
      throw new InputError('trim', `trim: the trim (${mm(job.trim)}) must be shorter than every stock bar (stock[${i}] is ${mm(s.length)})`);
    }
  });
  const usable = Math.max(...job.stock.map((s) => s.length - job.trim));
  const longest = Math.max(...job.stock.map((s) => s.length));
  job.parts.forEach((p, i) => {
    if (p.length <= 0) {
      throw new InputError(`parts[${i}].length`, `parts[${i}].length: ${partName(p, i)} has length ${p.length}; lengths must be positive`);
    }
    if (p.length > usable + 1e-9) {
      const trimNote = job.trim > 0 ? ` after the ${mm(job.trim)} trim` : '';
      throw new InputError(
        `parts[${i}].length`,
        `parts[${i}].length: ${partName(p, i)} (${mm(p.length)}) is longer than every stock bar (${mm(longest)}${trimNote})`,
      );
    }
  });
  if (job.parts.every((p) => p.qty === 0)) throw new InputError('parts', 'parts: every part has quantity 0; nothing to cut');
  return job;
}
