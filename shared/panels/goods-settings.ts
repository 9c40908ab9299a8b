// The builder's choices for the sheet goods, kept with the frame: slide type and the values off their slide's
// instruction sheet, joint, faces, panel mounting, densities they weighed, the sheets they buy, offcuts on hand, kerf
// and trim. Every field is optional and bounded; what is left out takes the defaults the product shows.
import { z } from 'zod';
import { DEFAULT_SHEET_KERF, DEFAULT_SHEET_TRIM } from '../sheets/from-goods';
import { sheetStockSchema } from '../sheets/job';
import { DENSITY_MAX_KG_M3, DENSITY_MIN_KG_M3 } from './materials';
import { slideRulesSchema } from './slides';

/** The builder's own slide values over the preset (nominal lengths and screws included). */
const slideValuesSchema = slideRulesSchema.omit({ type: true }).partial().strict();

const MAX_DENSITIES = 20;
const MAX_OFFCUTS = 30;

export const goodsSettingsSchema = z.strictObject({
  slide: z.enum(['side-mount', 'under-mount']).default('side-mount'),
  /** Nominal slide lengths sold in millimetres or in inches (the preset's list). */
  series: z.enum(['metric', 'inch']).default('metric'),
  slideValues: slideValuesSchema.default({}),
  joint: z.enum(['butt', 'dado']).default('butt'),
  faceStyle: z.enum(['inset', 'overlay']).default('inset'),
  panelMount: z.enum(['slot', 'surface']).default('surface'),
  /** kg/m³ by sheet material id, where the builder replaced the typical value. */
  densities: z
    .record(z.string().min(1).max(60), z.number().finite().min(DENSITY_MIN_KG_M3).max(DENSITY_MAX_KG_M3))
    .refine((r) => Object.keys(r).length <= MAX_DENSITIES, `at most ${MAX_DENSITIES} densities`)
    .default({}),
  /**
   * The sheet they buy; absent until they set one, and then the usual sheet of the unit the frame reads lengths in
   * (2440 × 1220 mm, or 8 × 4 ft in inches), so a frame started in an inch workshop plans on 8 × 4 ft sheets. A sheet
   * once set stays as set, whatever the units do later.
   */
  sheet: sheetStockSchema.strict().optional(),
  offcuts: z.array(sheetStockSchema.strict()).max(MAX_OFFCUTS, `at most ${MAX_OFFCUTS} offcuts`).default([]),
  kerf: z.number().finite().min(0).max(20).default(DEFAULT_SHEET_KERF),
  trim: z.number().finite().min(0).max(200).default(DEFAULT_SHEET_TRIM),
});
export type GoodsSettings = z.output<typeof goodsSettingsSchema>;
export type GoodsSettingsInput = z.input<typeof goodsSettingsSchema>;
