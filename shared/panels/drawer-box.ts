// A drawer box sized from its opening and its slide's rules. The opening is measured between the inner faces of the
// members around it; the box is the outside of the box (sides, front, back), the bottom sits in a groove all round.
import { z } from 'zod';
import { InputError } from '../errors';
import type { HardwareLine, SheetPart } from './parts';
import { nominalSlideLength, slideRulesSchema, type SlideRules } from './slides';

const len = (min: number, max: number) => z.number().finite().min(min).max(max);

export const drawerBoxInputSchema = z.object({
  opening: z.object({ width_mm: len(50, 3000), height_mm: len(30, 3000), depth_mm: len(100, 3000) }),
  slide: slideRulesSchema,
  joint: z.enum(['butt', 'dado']).default('butt'),
  /** Sides, front and back. */
  thickness_mm: len(3, 40).default(12),
  bottomThickness_mm: len(3, 25).default(6),
  /** Depth of the bottom groove; defaults to half the side's thickness, the most the common practice allows. */
  grooveDepth_mm: len(0.5, 20).optional(),
  /** Height of the groove's lower edge above the sides' lower edge; defaults to the slide's recess, or 10 mm. */
  grooveOffset_mm: len(0, 200).optional(),
  /** Dado joint: depth of the housing in the side that takes the front and back; defaults to half the thickness. */
  dadoDepth_mm: len(0.5, 20).optional(),
  /** The bottom is cut this much smaller than groove-to-groove in each direction so it drops in (common practice). */
  bottomPlay_mm: len(0, 5).default(1),
  /** What the slide is fixed to on each side: a member in line with it, or nothing (L-brackets to the uprights). */
  support: z.object({ left: z.enum(['member', 'bracket']), right: z.enum(['member', 'bracket']) }).default({ left: 'member', right: 'member' }),
});
export type DrawerBoxInput = z.input<typeof drawerBoxInputSchema>;

export type DrawerBox = {
  slide: SlideRules;
  slide_length_mm: number;
  box: { width_mm: number; height_mm: number; length_mm: number };
  bottom: { width_mm: number; length_mm: number; thickness_mm: number; groove_depth_mm: number; groove_offset_mm: number };
  parts: SheetPart[];
  hardware: HardwareLine[];
};

const mmText = (v: number): string => `${Number(v.toFixed(2))} mm`;

/** Parse with the schema and name the field at fault (a dotted path such as `opening.depth_mm`). */
export function parseDrawerBoxInput(input: unknown): z.output<typeof drawerBoxInputSchema> {
  const parsed = drawerBoxInputSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = issue.path.map(String).join('.') || 'drawer';
    throw new InputError(field, `${field}: ${issue.message}`);
  }
  return parsed.data;
}

/** `text` writes the lengths in a refusal, so the editor says them in the builder's unit (mm for the command line). */
export function drawerBox(input: DrawerBoxInput, text: (mm: number) => string = mmText): DrawerBox {
  const d = parseDrawerBoxInput(input);
  const { slide, opening } = d;
  const t = d.thickness_mm;
  if (slide.maxSideThickness_mm !== null && t > slide.maxSideThickness_mm + 1e-9) {
    throw new InputError('thickness_mm', `thickness_mm: this slide takes sides up to ${text(slide.maxSideThickness_mm)} thick (got ${text(t)})`);
  }
  const groove = d.grooveDepth_mm ?? t / 2;
  if (groove > t / 2 + 1e-9) {
    throw new InputError('grooveDepth_mm', `grooveDepth_mm: at most half the side's thickness, ${text(t / 2)} (common practice; got ${text(groove)})`);
  }
  const dado = d.joint === 'dado' ? (d.dadoDepth_mm ?? t / 2) : 0;
  if (dado > t / 2 + 1e-9) throw new InputError('dadoDepth_mm', `dadoDepth_mm: at most half the side's thickness, ${text(t / 2)} (got ${text(dado)})`);

  const length = nominalSlideLength(slide, opening.depth_mm);
  if (length === null) {
    const shortest = Math.min(...slide.lengths_mm);
    throw new InputError('opening.depth_mm', `opening.depth_mm: ${text(opening.depth_mm)} is too shallow for the shortest slide (${text(shortest)} + ${text(slide.rearClearance_mm)} behind it)`);
  }
  const width = opening.width_mm - 2 * slide.sideDeduction_mm;
  const height = opening.height_mm - slide.topClearance_mm - slide.bottomClearance_mm;
  const inner = width - 2 * t;
  if (inner <= 0) throw new InputError('opening.width_mm', `opening.width_mm: ${text(opening.width_mm)} leaves no room inside the box after the slides and two ${text(t)} sides`);
  const grooveOffset = d.grooveOffset_mm ?? (slide.bottomRecess_mm > 0 ? slide.bottomRecess_mm : 10);
  if (slide.bottomRecess_mm > 0 && grooveOffset + 1e-9 < slide.bottomRecess_mm) {
    throw new InputError('grooveOffset_mm', `grooveOffset_mm: the bottom must sit at least ${text(slide.bottomRecess_mm)} up to hide the slide (got ${text(grooveOffset)})`);
  }
  if (height < grooveOffset + d.bottomThickness_mm + 20) {
    throw new InputError('opening.height_mm', `opening.height_mm: ${text(opening.height_mm)} leaves a box ${text(height)} high, too low for its bottom ${text(grooveOffset)} up`);
  }

  const bottomW = inner + 2 * groove - d.bottomPlay_mm;
  const bottomL = length - 2 * t + 2 * groove - d.bottomPlay_mm;
  const endLength = inner + 2 * dado;
  const parts: SheetPart[] = [
    { name: 'Side', length_mm: length, width_mm: height, thickness_mm: t, qty: 2, grain: true },
    { name: 'Front', length_mm: endLength, width_mm: height, thickness_mm: t, qty: 1, grain: true },
    { name: 'Back', length_mm: endLength, width_mm: height, thickness_mm: t, qty: 1, grain: true },
    { name: 'Bottom', length_mm: bottomL, width_mm: bottomW, thickness_mm: d.bottomThickness_mm, qty: 1, grain: false },
  ];
  return {
    slide,
    slide_length_mm: length,
    box: { width_mm: width, height_mm: height, length_mm: length },
    bottom: { width_mm: bottomW, length_mm: bottomL, thickness_mm: d.bottomThickness_mm, groove_depth_mm: groove, groove_offset_mm: grooveOffset },
    parts,
    hardware: drawerHardware(d.slide, length, height, d.joint, d.support),
  };
}

function drawerHardware(slide: SlideRules, length: number, height: number, joint: 'butt' | 'dado', support: { left: string; right: string }): HardwareLine[] {
  const n = slide.screwsPerSlide;
  const lines: HardwareLine[] = [{ item: `Drawer slide pair, ${slide.type}, ${Math.round(length)} mm`, qty: 1, note: 'one pair per drawer' }];
  const onMember = [support.left, support.right].filter((s) => s === 'member').length;
  const onBracket = 2 - onMember;
  if (onMember) {
    lines.push({ item: 'Screw into T-nut (slide to member)', qty: n * onMember, note: `${n} per slide on a member in line with it` });
    lines.push({ item: 'T-nut, drop-in', qty: n * onMember, note: 'drop-in: the slot is closed by the time slides go on' });
  }
  if (onBracket) {
    // Two brackets per slide, one at each upright; one screw into a T-nut in each upright, the slide screwed to them.
    lines.push({ item: 'L-bracket (slide to upright)', qty: 2 * onBracket, note: 'no member in line with the slide: one bracket at the front upright, one at the back' });
    lines.push({ item: 'Screw into T-nut (bracket to upright)', qty: 2 * onBracket, note: 'one per bracket' });
    lines.push({ item: 'T-nut, drop-in', qty: 2 * onBracket, note: 'one per bracket' });
    lines.push({ item: 'Machine screw and nut (slide to bracket)', qty: 2 * onBracket, note: 'one per bracket' });
  }
  lines.push({ item: 'Wood screw (slide to box side)', qty: 2 * n, note: `${n} per slide` });
  if (joint === 'butt') {
    // A pocket screw every 100 mm of height, at least two per corner (common practice, no source).
    const per = Math.max(2, Math.ceil(height / 100));
    lines.push({ item: 'Pocket screw (box corners)', qty: 4 * per, note: `${per} per corner, glued` });
  }
  return lines;
}
