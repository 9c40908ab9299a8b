import { z } from 'zod';
import { LIMITS, lengthMm } from '../limits';
import { idSchema, nameSchema } from './ids';
import { placeSchema } from './position';

export const MODULE_KINDS = ['appliance', 'sink', 'drawer-stack', 'tank', 'shelf', 'other'] as const;
export const moduleKindSchema = z.enum(MODULE_KINDS);
export type ModuleKind = z.infer<typeof moduleKindSchema>;

/**
 * How a module's weight reaches the frame: `base` on the members under it, `side-rails` on the members beside it
 * (drawer slides), `hung` from the members above it.
 */
export const bearingSchema = z.enum(['base', 'side-rails', 'hung']);
export type Bearing = z.infer<typeof bearingSchema>;

/** Water, 1 kg per litre (physics; 0.998 kg/L at 20 °C, rounded up for a full tank). */
export const WATER_KG_PER_LITRE = 1;

/**
 * Fixing points per module by how it bears, each one screw and one T-nut: four at the corners of a base, three
 * per slide on two side rails, four hangers. Common practice, no source.
 */
export const DEFAULT_MOUNT_POINTS: Readonly<Record<Bearing, number>> = { base: 4, 'side-rails': 6, hung: 4 };
/** Thickness a mounting screw clamps (a sheet-metal tab or slide flange): common practice, no source. */
export const DEFAULT_MOUNT_CLAMP_MM = 3;
/**
 * How far a side-rail module may stand off its rails and still bear on them: a side-mount ball-bearing slide
 * takes about 1/2 in (12.7 mm) per side (common practice, see DOMAIN.md), plus a little for fit.
 */
export const DEFAULT_SIDE_GAP_MM = 15;

const mass = () => z.number().nonnegative('must not be negative').max(LIMITS.mass_kg, `must be at most ${LIMITS.mass_kg} kg`);

const sizeSchema = z.strictObject({
  w_mm: lengthMm().positive('must be more than 0'),
  d_mm: lengthMm().positive('must be more than 0'),
  h_mm: lengthMm().positive('must be more than 0'),
});

/** Most alternatives one module may carry (a bound on input). */
export const MAX_OPTIONS = 12;

/**
 * An alternative for a module ("pressed-steel sink, 5 kg" against "fireclay sink, 25 kg"): what it would change.
 * Fields left out stay as the module has them.
 */
export const moduleOptionSchema = z.strictObject({
  name: nameSchema.min(1, 'must not be empty'),
  mass_kg: z.number().nonnegative('must not be negative').max(5000, 'must be at most 5000 kg'),
  contents_kg: z.number().nonnegative('must not be negative').max(5000, 'must be at most 5000 kg').optional(),
  litres: z.number().nonnegative('must not be negative').max(5000, 'must be at most 5000 L').optional(),
  size: sizeSchema.optional(),
});
export type ModuleOption = z.output<typeof moduleOptionSchema>;

/**
 * Something the frame holds, as a box: w along x, d along y, h along z. `mass_kg` is the module as installed;
 * `contents_kg` what it holds (food, tools); a tank's `litres` count as water when full. A module in a run's bay
 * takes its position along the run from the bay; `place` gives the other axes (low face by default).
 * `bearsOn` names the members it bears on; when absent they are found from the geometry.
 */
export const moduleSchema = z
  .strictObject({
    type: z.literal('module'),
    id: idSchema,
    name: nameSchema.optional(),
    kind: moduleKindSchema,
    size: sizeSchema,
    mass_kg: mass(),
    contents_kg: mass().default(0),
    litres: z.number().nonnegative('must not be negative').max(LIMITS.mass_kg, `must be at most ${LIMITS.mass_kg} L`).optional(),
    bearing: bearingSchema,
    place: placeSchema,
    bearsOn: z.array(idSchema).max(LIMITS.listItems, `at most ${LIMITS.listItems} members`).optional(),
    mounting: z
      .strictObject({
        points: z.number().int('must be a whole number').nonnegative('must not be negative').max(100, 'must be at most 100').optional(),
        clamp_mm: lengthMm().nonnegative('must not be negative').optional(),
      })
      .optional(),
    sideGap_mm: lengthMm().nonnegative('must not be negative').optional(),
    options: z.array(moduleOptionSchema).max(MAX_OPTIONS, `at most ${MAX_OPTIONS} options`).optional(),
  })
  .superRefine((m, ctx) => {
    if (m.litres !== undefined && m.kind !== 'tank') {
      ctx.addIssue({ code: 'custom', path: ['litres'], message: 'only a tank has litres' });
    }
  });
export type Module = z.output<typeof moduleSchema>;
export type ModuleInput = z.input<typeof moduleSchema>;

/** A module's kind in words ("drawer stack"), as the builder reads it. */
export const KIND_WORDS: Readonly<Record<ModuleKind, string>> = {
  appliance: 'appliance',
  sink: 'sink',
  'drawer-stack': 'drawer stack',
  tank: 'tank',
  shelf: 'shelf',
  other: 'module',
};

/**
 * How a module is named to the builder: the name they gave it, else its kind in words. Messages use this, never
 * the record id, which the builder never typed.
 */
export function moduleLabel(m: Pick<Module, 'name' | 'kind'>): string {
  const name = m.name?.trim();
  return name ? `“${name}”` : `the ${KIND_WORDS[m.kind]}`;
}

/** A module's name for a list or a heading: the name they gave it, else its kind ("Drawer stack"), never its id. */
export function moduleTitle(m: Pick<Module, 'name' | 'kind'>): string {
  const name = m.name?.trim();
  if (name) return name;
  const words = KIND_WORDS[m.kind];
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** The three ways a module bears, in the words the editor offers them. */
export const BEARING_WORDS: Readonly<Record<Bearing, string>> = {
  base: 'sits on',
  hung: 'hangs from',
  'side-rails': 'runs on side rails',
};

/** Installed mass including contents; a tank counts full (water at 1 kg/L). */
export function moduleMass_kg(m: Pick<Module, 'mass_kg' | 'contents_kg' | 'litres'>): number {
  return m.mass_kg + m.contents_kg + (m.litres ?? 0) * WATER_KG_PER_LITRE;
}
