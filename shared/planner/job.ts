// The cutting job for one profile, and its validation. Lengths in millimetres.
//
// Kerf convention: on each bar, trim + Σ parts + (parts − 1) × kerf ≤ bar length. The leftover after the last part is
// separated by one more kerf if it is kept; a kept leftover of at least `minOffcut` is a reusable offcut, anything
// shorter is waste.
//
// The schema is strict: a key it does not know (`kerf_mm` for `kerf`) is an error naming the key, never silently
// dropped, since a dropped kerf or trim gives a plan that does not fit the real bars. Every count is bounded so that
// one request cannot make the planner (or anything that lists the pieces) grow without limit.
import { z } from 'zod';
import { InputError } from '../errors';

/** Kerf when the job gives none: a common saw blade for extrusion cuts about 3 mm (common practice, no source), the frame default too. */
export const DEFAULT_KERF_MM = 3;
/** Longest bar or part (100 m), widest kerf, trim. */
export const MAX_LENGTH_MM = 100_000;
export const MAX_KERF_MM = 50;
export const MAX_TRIM_MM = 1000;
/** Pieces of one part line, pieces in all (Σ qty), part lines, stock lines, bars of one stock line on hand. */
export const MAX_PART_QTY = 10_000;
export const MAX_PIECES = 10_000;
export const MAX_PART_LINES = 2_000;
export const MAX_STOCK_LINES = 50;
export const MAX_STOCK_QTY = 10_000;
export const MAX_PRICE = 1_000_000;

const length = z.number().finite().max(MAX_LENGTH_MM);

export const stockSchema = z.strictObject({
  length: length,
  price: z.number().finite().min(0).max(MAX_PRICE).optional(),
  /** Bars available (offcuts on the shelf), or null/absent for as many as needed. */
  qty: z.number().int().min(0).max(MAX_STOCK_QTY).nullable().optional(),
  label: z.string().max(200).optional(),
});

export const partSchema = z.strictObject({
  length: length,
  qty: z.number().int().min(0).max(MAX_PART_QTY),
  label: z.string().max(200).default(''),
});

export const cutJobSchema = z
  .strictObject({
    kerf: z.number().finite().min(0).max(MAX_KERF_MM).default(DEFAULT_KERF_MM),
    trim: z.number().finite().min(0).max(MAX_TRIM_MM).default(0),
    minOffcut: z.number().finite().min(0).max(MAX_LENGTH_MM).default(0),
    stock: z.array(stockSchema).min(1).max(MAX_STOCK_LINES),
    parts: z.array(partSchema).min(1).max(MAX_PART_LINES),
  })
  .superRefine((job, ctx) => {
    const pieces = job.parts.reduce((s, p) => s + p.qty, 0);
    if (pieces > MAX_PIECES) {
      ctx.addIssue({ code: 'custom', path: ['parts'], message: `${pieces} pieces in all; at most ${MAX_PIECES} per job` });
    }
    // A bar without a price beside priced ones would be free and unlimited: the plan would buy only it.
    const priced = job.stock.findIndex((s) => s.price !== undefined);
    if (priced >= 0) {
      job.stock.forEach((s, i) => {
        if (s.price === undefined) {
          ctx.addIssue({
            code: 'custom',
            path: ['stock', i, 'price'],
            message: `stock[${i}] (${s.length} mm) has no price while stock[${priced}] has one; give every stock line a price (0 for offcuts on hand)`,
          });
        }
      });
    }
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
    const path = issue.code === 'unrecognized_keys' ? [...issue.path, issue.keys[0]] : issue.path;
    const field = path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '');
    if (issue.code === 'unrecognized_keys') {
      const known = issue.path.length === 0 ? ['kerf', 'trim', 'minOffcut', 'stock', 'parts'] : issue.path[0] === 'stock' ? ['length', 'price', 'qty', 'label'] : ['length', 'qty', 'label'];
      const names = issue.keys.map((k) => `"${k}"`).join(', ');
      const near = known.find((k) => issue.keys[0].toLowerCase().replace(/[^a-z]/g, '').startsWith(k.toLowerCase()));
      const hint = near ? ` (did you mean "${near}"? lengths are in mm)` : '';
      throw new InputError(field, `${field}: unknown key${issue.keys.length > 1 ? 's' : ''} ${names}${hint}; the keys here are ${known.join(', ')}`);
    }
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
