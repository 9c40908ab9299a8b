// Panels that close a bay (a side, the back, the floor or the top), sized from the opening between the inner faces
// of the members around it.
//  - In the slot: the panel's edges run in the members' slots, so it is the opening plus the engagement on every
//    edge; its thickness must pass the slot opening. It has to go in before the frame is closed around it.
//  - Surface-mounted: the panel covers the members' outer faces (the opening plus one profile width each side, or a
//    chosen lap) and is screwed into drop-in T-nuts in the slots, so it comes off again.
import { z } from 'zod';
import { InputError } from '../errors';
import type { HardwareLine, SheetPart } from './parts';

const len = (min: number, max: number) => z.number().finite().min(min).max(max);

export const bayPanelInputSchema = z.object({
  name: z.string().min(1).max(120),
  opening: z.object({ length_mm: len(20, 5000), width_mm: len(20, 5000) }),
  mount: z.enum(['slot', 'surface']),
  thickness_mm: len(2, 40),
  /** The profile's slot opening and face width. */
  slot_mm: len(3, 20),
  profile_mm: len(10, 200),
  /** Slot: how far the panel runs into each slot; defaults to the slot opening (common practice, no source). */
  engagement_mm: len(1, 30).optional(),
  /** Slot: how deep the slot is below the face, where the profile's sheet gives it; the engagement must not reach past it. */
  slotDepth_mm: len(1, 60).optional(),
  /** Slot: total play left in each direction so the panel slides in (common practice, no source). */
  play_mm: len(0, 5).default(1),
  /** Surface: how far the panel laps over each member; defaults to the profile's full face. */
  lap_mm: len(0, 200).optional(),
  /** Surface: greatest spacing of screws along an edge (common practice: about 300 mm, no source). */
  screwSpacing_mm: len(50, 1000).default(300),
  grain: z.boolean().default(true),
});
export type BayPanelInput = z.input<typeof bayPanelInputSchema>;

export type BayPanel = { part: SheetPart; hardware: HardwareLine[]; screws: number; notes: string[] };

const fmt = (v: number): string => `${Number(v.toFixed(2))} mm`;

export function bayPanel(input: BayPanelInput): BayPanel {
  const parsed = bayPanelInputSchema.safeParse(input);
  if (!parsed.success) {
    const field = parsed.error.issues[0].path.map(String).join('.') || 'panel';
    throw new InputError(field, `${field}: ${parsed.error.issues[0].message}`);
  }
  const p = parsed.data;
  const { length_mm: L, width_mm: W } = p.opening;
  if (p.mount === 'slot') {
    if (p.thickness_mm > p.slot_mm) {
      throw new InputError('thickness_mm', `thickness_mm: a ${fmt(p.thickness_mm)} panel does not pass a ${fmt(p.slot_mm)} slot opening; use a thinner panel or mount it on the surface`);
    }
    const e = p.engagement_mm ?? p.slot_mm;
    if (p.slotDepth_mm !== undefined && e > p.slotDepth_mm) {
      throw new InputError('engagement_mm', `engagement_mm: a panel cannot run ${fmt(e)} into a slot ${fmt(p.slotDepth_mm)} deep; engage it at most ${fmt(p.slotDepth_mm)}`);
    }
    const part: SheetPart = { name: p.name, length_mm: L + 2 * e - p.play_mm, width_mm: W + 2 * e - p.play_mm, thickness_mm: p.thickness_mm, qty: 1, grain: p.grain };
    const notes = [`runs ${fmt(e)} into each slot`, 'slide it in before the members around it are closed'];
    if (p.slot_mm - p.thickness_mm > 2) notes.push(`${fmt(p.slot_mm - p.thickness_mm)} looser than the slot: add a slot cover strip or it will rattle`);
    return { part, hardware: [], screws: 0, notes };
  }
  const lap = p.lap_mm ?? p.profile_mm;
  const length = L + 2 * lap;
  const width = W + 2 * lap;
  // Screws along each edge at most `screwSpacing_mm` apart, one at each corner: corners shared, so per edge
  // ceil(edge / spacing) spaces, and the total is the sum of spaces round the perimeter.
  const along = (edge: number) => Math.max(1, Math.ceil(edge / p.screwSpacing_mm));
  const screws = 2 * along(length) + 2 * along(width);
  const part: SheetPart = { name: p.name, length_mm: length, width_mm: width, thickness_mm: p.thickness_mm, qty: 1, grain: p.grain };
  return {
    part,
    screws,
    notes: [`laps ${fmt(lap)} over each member`],
    hardware: [
      { item: 'Screw into T-nut (panel to member)', qty: screws, note: `at most ${fmt(p.screwSpacing_mm)} apart along each edge` },
      { item: 'T-nut, drop-in', qty: screws, note: 'drop-in: the panel goes on after the frame is built' },
    ],
  };
}
