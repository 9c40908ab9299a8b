// Drawer faces for a stack in one opening (the front opening between the members' inner faces). Inset faces sit
// inside the opening with a gap all round; overlay faces lap over the members by `overlay_mm` on every outer edge.
// Faces are screwed on from inside the box, not glued, so they can come off to be refinished (common practice).
import { z } from 'zod';
import { InputError } from '../errors';
import type { HardwareLine, SheetPart } from './parts';

const len = (min: number, max: number) => z.number().finite().min(min).max(max);

export const drawerFacesInputSchema = z.object({
  opening: z.object({ width_mm: len(50, 3000), height_mm: len(30, 3000) }),
  style: z.enum(['inset', 'overlay']),
  /** Relative heights of the faces, top first (e.g. [1, 1, 2]). */
  shares: z.array(z.number().finite().min(0.05).max(100)).min(1).max(20),
  /** Gap between faces, and (inset) between a face and the opening. 2–3 mm is common practice. */
  gap_mm: len(0, 20).default(3),
  /** Overlay: how far each face's outer edge laps over the frame. */
  overlay_mm: len(0, 100).default(15),
  thickness_mm: len(3, 40).default(18),
  /** Screws from inside per face (common practice: four, one near each corner). */
  screwsPerFace: z.number().int().min(2).max(12).default(4),
});
export type DrawerFacesInput = z.input<typeof drawerFacesInputSchema>;

export type DrawerFace = { index: number; width_mm: number; height_mm: number; bottom_mm: number };

/** Face sizes, top first; `bottom_mm` is each face's lower edge above the opening's bottom edge. */
export function drawerFaces(input: DrawerFacesInput): { faces: DrawerFace[]; parts: SheetPart[]; hardware: HardwareLine[] } {
  const parsed = drawerFacesInputSchema.safeParse(input);
  if (!parsed.success) {
    const field = parsed.error.issues[0].path.map(String).join('.') || 'faces';
    throw new InputError(field, `${field}: ${parsed.error.issues[0].message}`);
  }
  const f = parsed.data;
  const n = f.shares.length;
  const inset = f.style === 'inset';
  const width = inset ? f.opening.width_mm - 2 * f.gap_mm : f.opening.width_mm + 2 * f.overlay_mm;
  // Inset: n + 1 gaps inside the opening. Overlay: the stack spans the opening plus an overlay top and bottom, with
  // n − 1 gaps between faces.
  const span = inset ? f.opening.height_mm - (n + 1) * f.gap_mm : f.opening.height_mm + 2 * f.overlay_mm - (n - 1) * f.gap_mm;
  if (width <= 0 || span <= 0) throw new InputError('gap_mm', 'gap_mm: the gaps leave no room for the faces');
  const total = f.shares.reduce((a, b) => a + b, 0);
  const faces: DrawerFace[] = [];
  let top = inset ? f.opening.height_mm - f.gap_mm : f.opening.height_mm + f.overlay_mm;
  f.shares.forEach((s, i) => {
    const h = (span * s) / total;
    faces.push({ index: i, width_mm: width, height_mm: h, bottom_mm: top - h });
    top -= h + f.gap_mm;
  });
  const parts: SheetPart[] = faces.map((x) => ({ name: `Face ${x.index + 1}`, length_mm: x.width_mm, width_mm: x.height_mm, thickness_mm: f.thickness_mm, qty: 1, grain: true }));
  const hardware: HardwareLine[] = [{ item: 'Wood screw (face from inside the box)', qty: n * f.screwsPerFace, note: `${f.screwsPerFace} per face, not glued so the face can come off` }];
  return { faces, parts, hardware };
}
