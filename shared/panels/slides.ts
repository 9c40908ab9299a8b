// Drawer-slide rules as editable presets. The numbers are typical, not any maker's: the builder enters the values
// from the instruction sheet of the slide they bought, and the product shows that note beside every preset.
import { z } from 'zod';

export const SLIDE_NOTE = 'typical — check your slide’s instruction sheet';

const len = (max: number) => z.number().finite().min(0).max(max);

export const slideRulesSchema = z.object({
  type: z.enum(['side-mount', 'under-mount']),
  /** Taken off the opening's width on each side (the slide's body and its running clearance). */
  sideDeduction_mm: len(60),
  /** Room kept above and below the box inside the opening. */
  topClearance_mm: len(100),
  bottomClearance_mm: len(100),
  /** Depth the slide needs behind its nominal length (rear bracket, the box's back clearance). */
  rearClearance_mm: len(100),
  /** Under-mount: the bottom is raised this far above the sides' lower edge to hide the slide. 0 for side-mount. */
  bottomRecess_mm: len(100),
  /** Under-mount: thickest box side the slide's hooks accept; null where the slide sets no limit. */
  maxSideThickness_mm: len(60).nullable(),
  /** Nominal lengths sold, in millimetres; the longest that fits the depth is chosen. */
  lengths_mm: z.array(z.number().finite().min(100).max(2000)).min(1).max(60),
  /** Screws or bolts through the slide's holes into the frame, per slide (both halves counted on the cabinet side). */
  screwsPerSlide: z.number().int().min(1).max(20),
});
export type SlideRules = z.output<typeof slideRulesSchema>;
export type SlideType = SlideRules['type'];

const inch = (v: number): number => v * 25.4;
export type SlideSeries = 'metric' | 'inch';
/** Side-mount slides are commonly sold 250–700 mm in 50 mm steps, or 10–28 in in 2 in steps (common practice). */
const SIDE_MOUNT_LENGTHS: Record<SlideSeries, number[]> = {
  metric: [250, 300, 350, 400, 450, 500, 550, 600, 650, 700],
  inch: [10, 12, 14, 16, 18, 20, 22, 24, 26, 28].map(inch),
};
/** Concealed slides are commonly sold 250–600 mm, or 9–21 in in 3 in steps (recalled [M]). */
const UNDER_MOUNT_LENGTHS: Record<SlideSeries, number[]> = {
  metric: [250, 270, 300, 350, 400, 450, 500, 550, 600],
  inch: [9, 12, 15, 18, 21].map(inch),
};

/**
 * Side-mount ball-bearing slide: 1/2 in (12.7 mm) per side is the common practice (DOMAIN.md, no source); 1/2 in
 * above and below the box is a common fitting allowance (no source). Box length equals the slide length.
 */
export const SIDE_MOUNT: SlideRules = Object.freeze({
  type: 'side-mount',
  sideDeduction_mm: 12.7,
  topClearance_mm: 12.7,
  bottomClearance_mm: 12.7,
  rearClearance_mm: 0,
  bottomRecess_mm: 0,
  maxSideThickness_mm: null,
  lengths_mm: SIDE_MOUNT_LENGTHS.metric,
  screwsPerSlide: 3,
}) as SlideRules;

/**
 * Concealed under-mount slide, values recalled from common instruction sheets for 5/8 in sides [M]: 5/16 in off the
 * width each side, sides at most 5/8 in (16 mm), bottom raised 1/2 in, 1/4 in above and 1/2 in below the box, 1/4 in
 * behind the slide. Box length equals the slide's nominal length.
 */
export const UNDER_MOUNT: SlideRules = Object.freeze({
  type: 'under-mount',
  sideDeduction_mm: inch(5 / 16),
  topClearance_mm: inch(1 / 4),
  bottomClearance_mm: inch(1 / 2),
  rearClearance_mm: inch(1 / 4),
  bottomRecess_mm: inch(1 / 2),
  maxSideThickness_mm: 16,
  lengths_mm: UNDER_MOUNT_LENGTHS.metric,
  screwsPerSlide: 3,
}) as SlideRules;

/** A fresh, editable copy of a preset, with the nominal lengths sold in the builder's series. */
export function slidePreset(type: SlideType, series: SlideSeries = 'metric'): SlideRules {
  const base = type === 'side-mount' ? SIDE_MOUNT : UNDER_MOUNT;
  const lengths = type === 'side-mount' ? SIDE_MOUNT_LENGTHS : UNDER_MOUNT_LENGTHS;
  return { ...base, lengths_mm: [...lengths[series]] };
}

/** The longest nominal length that fits `depth_mm` with the slide's rear clearance, or null when none does. */
export function nominalSlideLength(rules: Pick<SlideRules, 'lengths_mm' | 'rearClearance_mm'>, depth_mm: number): number | null {
  const room = depth_mm - rules.rearClearance_mm;
  let best: number | null = null;
  // A hair of tolerance so 18 in (457.2 mm) fits a 457.2 mm depth despite float noise.
  for (const l of rules.lengths_mm) if (l <= room + 1e-6 && (best === null || l > best)) best = l;
  return best;
}
