// A countertop over a run: the run's outside size plus its overhangs, with the sink's cut-out (the sink module's
// footprint plus a clearance all round) placed where the module stands.
import { z } from 'zod';
import { InputError } from '../errors';
import type { SheetPart } from './parts';

const len = (min: number, max: number) => z.number().finite().min(min).max(max);

export const countertopInputSchema = z.object({
  /** Outside length (along the run) and depth (front to back) of the frame under the top. */
  run: z.object({ length_mm: len(100, 10000), depth_mm: len(100, 2000) }),
  overhang: z.object({ front_mm: len(0, 300).default(20), back_mm: len(0, 300).default(0), left_mm: len(0, 300).default(0), right_mm: len(0, 300).default(0) }).default({ front_mm: 20, back_mm: 0, left_mm: 0, right_mm: 0 }),
  thickness_mm: len(6, 60).default(18),
  /** The sink module's footprint, measured from the frame's left and front outside faces. */
  sink: z.object({ x_mm: len(0, 10000), y_mm: len(0, 2000), w_mm: len(50, 2000), d_mm: len(50, 2000) }).optional(),
  /** Added round the sink's footprint (common practice: a few mm so it drops in; check the sink's template). */
  clearance_mm: len(0, 50).default(3),
});
export type CountertopInput = z.input<typeof countertopInputSchema>;

export type Countertop = { part: SheetPart; cutout: { x_mm: number; y_mm: number; length_mm: number; width_mm: number } | null; notes: string[] };

/** `text` writes the lengths in the notes, in the builder's unit (mm unless told). */
export function countertop(input: CountertopInput, text: (mm: number) => string = (v) => `${Math.round(v)} mm`): Countertop {
  const parsed = countertopInputSchema.safeParse(input);
  if (!parsed.success) {
    const field = parsed.error.issues[0].path.map(String).join('.') || 'countertop';
    throw new InputError(field, `${field}: ${parsed.error.issues[0].message}`);
  }
  const c = parsed.data;
  const o = c.overhang;
  const length = c.run.length_mm + o.left_mm + o.right_mm;
  const width = c.run.depth_mm + o.front_mm + o.back_mm;
  const part: SheetPart = { name: 'Countertop', length_mm: length, width_mm: width, thickness_mm: c.thickness_mm, qty: 1, grain: true };
  if (!c.sink) return { part, cutout: null, notes: [] };
  // Cut-out corner measured from the top's own left and front edges.
  const cutout = {
    x_mm: o.left_mm + c.sink.x_mm - c.clearance_mm,
    y_mm: o.front_mm + c.sink.y_mm - c.clearance_mm,
    length_mm: c.sink.w_mm + 2 * c.clearance_mm,
    width_mm: c.sink.d_mm + 2 * c.clearance_mm,
  };
  if (cutout.x_mm < 0 || cutout.y_mm < 0 || cutout.x_mm + cutout.length_mm > length || cutout.y_mm + cutout.width_mm > width) {
    throw new InputError('sink', 'sink: the cut-out runs past the countertop’s edge');
  }
  const notes = ['Cut the sink opening from a drilled start hole with a jigsaw (eye and hearing protection, the top clamped down); seal its edges against water.'];
  const web = Math.min(cutout.y_mm, width - cutout.y_mm - cutout.width_mm);
  if (web < 50) notes.push(`Only ${text(web)} of top left in front of or behind the sink: it may crack there.`);
  return { part, cutout, notes };
}
