import { z } from 'zod';
import { ALLOY_IDS, type AlloyId } from '../catalog/alloys';
import { storable } from '../limits';
import { nameSchema } from './ids';

// Upper bounds far above any extrusion (a 1 m solid square bar has Ix ≈ 8.3e10 mm⁴), so only nonsense is refused.
const positive = (max: number) => z.number().positive('must be more than 0').max(max, `must be at most ${max}`);

/**
 * A profile as this frame uses it: a catalogue profile (or a plain section such as `tube:40x40x2`) with the
 * builder's own figures, e.g. from their supplier. `id` is what members name; `base` the catalogue profile it
 * starts from (the id itself when absent, so a record can simply correct a catalogue profile).
 */
export const profileOverrideSchema = z.strictObject({
  type: z.literal('profile'),
  id: z.string().min(1).max(64).regex(/^[A-Za-z0-9][A-Za-z0-9_.:x×-]*$/, 'must be a profile id'),
  base: storable(z.string().min(1).max(64)).optional(),
  name: nameSchema.optional(),
  overrides: z
    .strictObject({
      area_mm2: positive(1e6).optional(),
      Ix_mm4: positive(1e12).optional(),
      Iy_mm4: positive(1e12).optional(),
      Wx_mm3: positive(1e9).optional(),
      Wy_mm3: positive(1e9).optional(),
      mass_kg_per_m: positive(1e4).optional(),
      E_MPa: positive(1e6).optional(),
      yield_MPa: positive(1e4).optional(),
      alloy: z.enum(ALLOY_IDS as [AlloyId, ...AlloyId[]]).optional(),
    })
    .default({}),
});
export type ProfileOverride = z.output<typeof profileOverrideSchema>;
