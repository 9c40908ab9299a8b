import { z } from 'zod';
import { ALLOY_IDS, type AlloyId } from '../catalog/alloys';
import { nameSchema } from './ids';

const positive = z.number().positive('must be more than 0');

/**
 * A profile as this frame uses it: a catalogue profile (or a plain section such as `tube:40x40x2`) with the
 * builder's own figures, e.g. from their supplier. `id` is what members name; `base` the catalogue profile it
 * starts from (the id itself when absent, so a record can simply correct a catalogue profile).
 */
export const profileOverrideSchema = z.strictObject({
  type: z.literal('profile'),
  id: z.string().min(1).max(64).regex(/^[A-Za-z0-9][A-Za-z0-9_.:x×-]*$/, 'must be a profile id'),
  base: z.string().min(1).max(64).optional(),
  name: nameSchema.optional(),
  overrides: z
    .strictObject({
      area_mm2: positive.optional(),
      Ix_mm4: positive.optional(),
      Iy_mm4: positive.optional(),
      Wx_mm3: positive.optional(),
      Wy_mm3: positive.optional(),
      mass_kg_per_m: positive.optional(),
      E_MPa: positive.optional(),
      yield_MPa: positive.optional(),
      alloy: z.enum(ALLOY_IDS as [AlloyId, ...AlloyId[]]).optional(),
    })
    .default({}),
});
export type ProfileOverride = z.output<typeof profileOverrideSchema>;
