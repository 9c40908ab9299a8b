import { lengthText } from '@shared/display/format';
import { describe, expect, it } from 'vitest';
import { drawerBox, nominalSlideLength, slidePreset } from '@shared/panels/index';
import { errorOf } from '../../support/input-error';

// Hand-worked boxes. The rules are trade practice, not a standard: 1/2 in per side for side-mount ball-bearing
// slides (common practice, no source; DOMAIN.md), a bottom groove at most half the side's thickness (common practice,
// no source). The under-mount values are the preset's, recalled from common instruction sheets [M]. Inches are
// exactly 25.4 mm (NIST, Federal Register notice of 1 July 1959).
const IN = 25.4;

describe('side-mount ball-bearing slide, worked in inches', () => {
  // Opening 20 × 6 × 22 in, 1/2 in sides and ends, 1/4 in groove, bottom cut to the groove bottoms (no play):
  // box 20 − 2·1/2 = 19 in wide, 6 − 1/2 − 1/2 = 5 in high; longest inch slide ≤ 22 in is 22 in → box 22 in long;
  // butt ends 19 − 2·1/2 = 18 in; bottom 18 + 2·1/4 = 18 1/2 in by 22 − 1 + 1/2 = 21 1/2 in.
  const box = drawerBox({
    opening: { width_mm: 20 * IN, height_mm: 6 * IN, depth_mm: 22 * IN },
    slide: slidePreset('side-mount', 'inch'),
    thickness_mm: 0.5 * IN,
    bottomThickness_mm: 0.25 * IN,
    bottomPlay_mm: 0,
  });
  it('box 19 × 5 × 22 in on a 22 in slide', () => {
    expect(box.slide_length_mm).toBeCloseTo(22 * IN, 9);
    expect(box.box.width_mm).toBeCloseTo(19 * IN, 9);
    expect(box.box.height_mm).toBeCloseTo(5 * IN, 9);
    expect(box.box.length_mm).toBeCloseTo(22 * IN, 9);
  });
  it('butt joint: sides 22 × 5 in, front and back 18 × 5 in, bottom 21 1/2 × 18 1/2 in in a 1/4 in groove', () => {
    const by = Object.fromEntries(box.parts.map((p) => [p.name, p]));
    expect(by.Side.qty).toBe(2);
    expect(by.Side.length_mm).toBeCloseTo(22 * IN, 9);
    expect(by.Side.width_mm).toBeCloseTo(5 * IN, 9);
    expect(by.Front.length_mm).toBeCloseTo(18 * IN, 9);
    expect(by.Back.length_mm).toBeCloseTo(18 * IN, 9);
    expect(box.bottom.groove_depth_mm).toBeCloseTo(0.25 * IN, 9);
    expect(box.bottom.width_mm).toBeCloseTo(18.5 * IN, 9);
    expect(box.bottom.length_mm).toBeCloseTo(21.5 * IN, 9);
    expect(by.Bottom.thickness_mm).toBeCloseTo(0.25 * IN, 9);
  });
  it('dado joint: the ends run 1/4 in into each side, 18 1/2 in long', () => {
    const dado = drawerBox({ opening: { width_mm: 20 * IN, height_mm: 6 * IN, depth_mm: 22 * IN }, slide: slidePreset('side-mount', 'inch'), thickness_mm: 0.5 * IN, joint: 'dado' });
    expect(dado.parts.find((p) => p.name === 'Front')?.length_mm).toBeCloseTo(18.5 * IN, 9);
  });
  it('a 21 in depth takes the 20 in slide (the next standard length down)', () => {
    expect(nominalSlideLength(slidePreset('side-mount', 'inch'), 21 * IN)).toBeCloseTo(20 * IN, 9);
  });
});

describe('side-mount slide, worked in millimetres', () => {
  // Opening 500 × 200 × 480 mm, 12 mm sides: 500 − 25.4 = 474.6 wide, 200 − 25.4 = 174.6 high; metric slides
  // 250–700 in 50 mm steps → 450 mm. Butt ends 474.6 − 24 = 450.6; groove 6; bottom with 1 mm play:
  // 450.6 + 12 − 1 = 461.6 by 450 − 24 + 12 − 1 = 437.
  const box = drawerBox({ opening: { width_mm: 500, height_mm: 200, depth_mm: 480 }, slide: slidePreset('side-mount'), thickness_mm: 12 });
  it('box 474.6 × 174.6 × 450 mm', () => {
    expect(box.slide_length_mm).toBe(450);
    expect(box.box.width_mm).toBeCloseTo(474.6, 9);
    expect(box.box.height_mm).toBeCloseTo(174.6, 9);
  });
  it('ends 450.6 mm, bottom 437 × 461.6 mm in a 6 mm groove', () => {
    expect(box.parts.find((p) => p.name === 'Front')?.length_mm).toBeCloseTo(450.6, 9);
    expect(box.bottom.groove_depth_mm).toBe(6);
    expect(box.bottom.width_mm).toBeCloseTo(461.6, 9);
    expect(box.bottom.length_mm).toBeCloseTo(437, 9);
  });
  it('slides on members: three screws and drop-in T-nuts a slide; none bracketed', () => {
    expect(box.hardware.find((h) => h.item.startsWith('T-nut'))?.qty).toBe(6);
    expect(box.hardware.some((h) => h.item.startsWith('L-bracket'))).toBe(false);
  });
  it('no member beside the right slide: two L-brackets for it, to the front and back uprights', () => {
    const b = drawerBox({ opening: { width_mm: 500, height_mm: 200, depth_mm: 480 }, slide: slidePreset('side-mount'), support: { left: 'member', right: 'bracket' } });
    expect(b.hardware.find((h) => h.item.startsWith('L-bracket'))?.qty).toBe(2);
    // 3 for the slide on the member + 1 per bracket.
    expect(b.hardware.filter((h) => h.item.startsWith('T-nut')).reduce((a, h) => a + h.qty, 0)).toBe(5);
  });
  it('a groove deeper than half the side is refused, naming the field', () => {
    expect(errorOf(() => drawerBox({ opening: { width_mm: 500, height_mm: 200, depth_mm: 480 }, slide: slidePreset('side-mount'), thickness_mm: 12, grooveDepth_mm: 7 })).field).toBe('grooveDepth_mm');
  });
  it('the refusal says its lengths in the writer given: half of a 12 mm side is 6 mm = 7.56/32 in → 1/4", 7 mm = 8.82/32 in → 9/32" (to 1/32)', () => {
    const input = { opening: { width_mm: 500, height_mm: 200, depth_mm: 480 }, slide: slidePreset('side-mount'), thickness_mm: 12, grooveDepth_mm: 7 };
    expect(errorOf(() => drawerBox(input)).message).toContain('half the side\'s thickness, 6 mm');
    expect(errorOf(() => drawerBox(input, (mm) => lengthText(mm, { display: 'in', frac: 32 }))).message).toContain('half the side\'s thickness, 1/4" (common practice; got 9/32")');
  });
  it('a depth shorter than the shortest slide is refused, naming the depth', () => {
    expect(errorOf(() => drawerBox({ opening: { width_mm: 500, height_mm: 200, depth_mm: 240 }, slide: slidePreset('side-mount') })).field).toBe('opening.depth_mm');
  });
  it('bounds: a negative width is refused, naming the field', () => {
    expect(errorOf(() => drawerBox({ opening: { width_mm: -5, height_mm: 200, depth_mm: 480 }, slide: slidePreset('side-mount') })).field).toBe('opening.width_mm');
  });
});

describe('concealed under-mount slide (preset values recalled [M]: 5/16 in a side, 1/4 in above, 1/2 in below, 1/2 in recess, 1/4 in behind)', () => {
  it('inches: opening 15 × 5 × 21 in, 5/8 in sides → box 14 3/8 × 4 1/4 in on an 18 in slide, bottom 1/2 in up', () => {
    // Depth room 21 − 1/4 = 20 3/4 in: the 21 in slide does not fit, 18 in does; box length = slide length.
    const box = drawerBox({ opening: { width_mm: 15 * IN, height_mm: 5 * IN, depth_mm: 21 * IN }, slide: slidePreset('under-mount', 'inch'), thickness_mm: (5 / 8) * IN });
    expect(box.slide_length_mm).toBeCloseTo(18 * IN, 9);
    expect(box.box.length_mm).toBeCloseTo(18 * IN, 9);
    expect(box.box.width_mm).toBeCloseTo((14 + 3 / 8) * IN, 9);
    expect(box.box.height_mm).toBeCloseTo((4 + 1 / 4) * IN, 9);
    expect(box.bottom.groove_offset_mm).toBeCloseTo(0.5 * IN, 9);
    expect(box.bottom.groove_depth_mm).toBeCloseTo((5 / 16) * IN, 9);
  });
  it('millimetres, with the values typed from a sheet: 450 × 140 × 520 opening, 15 mm sides, 5 mm a side, 14 mm recess', () => {
    const slide = { ...slidePreset('under-mount'), sideDeduction_mm: 5, bottomRecess_mm: 14, topClearance_mm: 6, bottomClearance_mm: 14, rearClearance_mm: 10 };
    const box = drawerBox({ opening: { width_mm: 450, height_mm: 140, depth_mm: 520 }, slide, thickness_mm: 15 });
    // 520 − 10 = 510 room → 500 mm slide; 450 − 10 = 440 wide; 140 − 20 = 120 high; ends 440 − 30 = 410.
    expect(box.slide_length_mm).toBe(500);
    expect(box.box.width_mm).toBe(440);
    expect(box.box.height_mm).toBe(120);
    expect(box.parts.find((p) => p.name === 'Back')?.length_mm).toBe(410);
    expect(box.bottom.groove_offset_mm).toBe(14);
  });
  it('sides thicker than the slide takes are refused, naming the thickness', () => {
    expect(errorOf(() => drawerBox({ opening: { width_mm: 450, height_mm: 140, depth_mm: 520 }, slide: slidePreset('under-mount'), thickness_mm: 18 })).field).toBe('thickness_mm');
  });
});
