import { z } from 'zod';
import { dateFormatSchema } from '../model/settings';
import { LIMITS, lengthMm } from '../limits';
import type { CutSessionPlan } from './shop';
import { text } from './common';

// The frozen cutting plan as data that arrives from outside (a project file): every field typed and bounded, so
// a plan read from a file is one the cutting screen and the saw list can work from, nothing larger.

const words = (max = 200) => text(z.string({ message: 'Must be text' }).max(max, { message: `At most ${max} characters` }));
const count = (max: number) => z.number({ message: 'Must be a number' }).int({ message: 'Must be a whole number' }).min(0).max(max, { message: `At most ${max}` });
const amount = z.number({ message: 'Must be a number' }).min(0).max(1e9);
const many = <T extends z.ZodType>(item: T, max: number) => z.array(item, { message: 'Must be a list' }).max(max, { message: `At most ${max} entries` });

const opSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('end-tap'), end: z.enum(['start', 'end']), thread: words(40), tapDrill_mm: lengthMm(), depth_mm: lengthMm() }),
  z.object({ kind: z.literal('access-hole'), at_mm: lengthMm(), face: words(40), diameter_mm: lengthMm() }),
]);

const partSchema = z.object({
  mark: words(40),
  profileId: words(64),
  profileName: words(),
  cutLength_mm: lengthMm(),
  qty: count(LIMITS.members),
  tolerance_mm: lengthMm().nullable(),
  ops: many(opSchema, LIMITS.listItems),
  members: many(words(), LIMITS.members),
});

const cutListSchema = z.object({
  kerf_mm: lengthMm(),
  toleranceClass: words(),
  parts: many(partSchema, LIMITS.members),
  hardware: many(z.object({ key: words(), kind: words(), name: words(), qty: count(1e6), spares: count(1e6), toBuy: count(1e6) }), LIMITS.joints),
  nutWarnings: many(
    z.object({
      mark: words(40).nullable(),
      message: words(1000),
      member: words().optional(),
      face: words(40).optional(),
      slot: count(100).optional(),
      count: count(1e6).optional(),
      closedBy: many(words(), LIMITS.listItems).optional(),
    }),
    LIMITS.joints,
  ),
});

const barSchema = z.object({
  stock_mm: lengthMm(),
  fromShelf: z.boolean(),
  price: amount,
  cuts: many(z.object({ length_mm: lengthMm(), mark: words(40) }), LIMITS.members),
  leftover_mm: lengthMm(),
  leftoverKept: z.boolean(),
});

const profilePlanSchema = z.object({
  profileId: words(64),
  profileName: words(),
  kerf_mm: lengthMm(),
  trim_mm: lengthMm(),
  bars: many(barSchema, LIMITS.members),
  cost: amount,
  waste_pct: z.number().min(0).max(100),
  lowerBound: count(LIMITS.members).nullable(),
  optimal: z.boolean(),
});

export const cutSessionPlanSchema = z.object({
  frameName: words(),
  cutList: cutListSchema,
  plans: many(profilePlanSchema, LIMITS.profiles),
  members: many(z.object({ id: words(64), mark: words(40), profile: words(64), cut_length_mm: lengthMm() }), LIMITS.members),
  settings: z.object({ trim_mm: lengthMm(), minOffcut_mm: lengthMm() }),
  // mass and date are absent on plans frozen before a frame had them.
  units: z.object({
    display: z.enum(['mm', 'in']),
    frac: z.union([z.literal(16), z.literal(32)]),
    mass: z.enum(['kg', 'lb']).optional(),
    date: dateFormatSchema.optional(),
  }),
}) satisfies z.ZodType<CutSessionPlan>;

/** Which planned cuts a plan has, by the key a tick names (`profile/bar/cut`), with their mark. */
export function planCutKeys(plan: CutSessionPlan): Map<string, string> {
  const keys = new Map<string, string>();
  for (const p of plan.plans) p.bars.forEach((b, bi) => b.cuts.forEach((c, ci) => keys.set(`${p.profileId}/${bi}/${ci}`, c.mark)));
  return keys;
}
