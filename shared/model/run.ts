import { z } from 'zod';
import { axisSchema } from './axis';
import { LIMITS, lengthMm } from '../limits';
import { idSchema, nameSchema } from './ids';
import { positionSchema } from './position';

/** Most modules one bay may stack, one above another (a bound on input, not a trade rule). */
export const MAX_STACK = 8;

/**
 * One opening of a run. With a module its width is the module's size along the run plus a clearance each side;
 * an open bay (no module) or a fixed-width bay gives `width_mm`. `stack` names further modules above `module`
 * (or above the seat of an open bay), bottom to top: a drawer over the cooler, a shelf over the tank. The bay is
 * as wide as the widest of them plus the clearances; each one's height comes from its own `place.z`, which a
 * cabinet layout chains to the module below, so resizing one moves what is above it.
 */
export const baySchema = z
  .strictObject({
    id: idSchema,
    name: nameSchema.optional(),
    module: idSchema.optional(),
    width_mm: lengthMm().positive('must be more than 0').optional(),
    clearance_mm: lengthMm().nonnegative('must not be negative').optional(),
    stack: z.array(idSchema).max(MAX_STACK, `a bay stacks at most ${MAX_STACK} modules`).optional(),
  })
  .superRefine((b, ctx) => {
    if (b.module === undefined && b.width_mm === undefined && !(b.stack && b.stack.length > 0)) {
      ctx.addIssue({ code: 'custom', path: ['width_mm'], message: 'an open bay needs a width (or give it a module)' });
    }
  });
export type Bay = z.output<typeof baySchema>;

/**
 * A row of bays along one axis, bounded by uprights `upright_mm` thick (their size along the run). The run
 * generates datums, which members and other datums refer to:
 * - `<run>.u<k>` the near face of the k-th upright (k = 0 … number of bays), `<run>.end` the far face of the last;
 * - `<bay>.start`, `<bay>.end`, `<bay>.mid` the bay's opening, which travel with the bay when bays are reordered.
 * Swapping modules reorders `bays`; resizing changes a module's size. Neither touches a member record.
 */
export const runSchema = z.strictObject({
  type: z.literal('run'),
  id: idSchema,
  name: nameSchema.optional(),
  axis: axisSchema.default('x'),
  start: positionSchema.prefault({}),
  upright_mm: lengthMm().nonnegative('must not be negative'),
  clearance_mm: lengthMm().nonnegative('must not be negative').default(0),
  bays: z.array(baySchema).min(1, 'a run needs at least one bay').max(LIMITS.baysPerRun, `at most ${LIMITS.baysPerRun} bays`),
});
export type Run = z.output<typeof runSchema>;
export type RunInput = z.input<typeof runSchema>;

/** The modules a bay holds, bottom to top. */
export function bayModuleIds(bay: Pick<Bay, 'module' | 'stack'>): string[] {
  return [...(bay.module !== undefined ? [bay.module] : []), ...(bay.stack ?? [])];
}

/** Datum ids a run generates, in order along the run (see runSchema). */
export function runDatumIds(run: Pick<Run, 'id' | 'bays'>): string[] {
  const ids: string[] = [];
  run.bays.forEach((bay, k) => ids.push(`${run.id}.u${k}`, `${bay.id}.start`, `${bay.id}.mid`, `${bay.id}.end`));
  ids.push(`${run.id}.u${run.bays.length}`, `${run.id}.end`);
  return ids;
}
