import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { lengthText } from '@shared/display/format';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import { bayPanel, countertop, drawerFaces, partMass_kg, reportWithSheetGoods, SHEET_MATERIALS } from '@shared/panels/index';
import { errorOf } from '../../support/input-error';

// An example frame (invented): 40×40 slot 8 profile, uprights at 0 and 640 mm (outer faces), rails at the floor
// and at 760 mm (outer faces). The bay's side opening between inner faces is 640 − 2·40 = 560 wide and
// 760 − 2·40 = 680 high. The panel rules (engagement = slot opening, 1 mm play, screws ≤ 300 mm apart) are
// common practice, no source.
const opening = { length_mm: 640 - 2 * 40, width_mm: 760 - 2 * 40 };

describe('bay panels on the example frame', () => {
  it('in the slot: a 6 mm panel runs 8 mm into each slot: 560 + 16 − 1 = 575 by 680 + 16 − 1 = 695', () => {
    const p = bayPanel({ name: 'Side', opening, mount: 'slot', thickness_mm: 6, slot_mm: 8, profile_mm: 40 });
    expect(p.part.length_mm).toBe(575);
    expect(p.part.width_mm).toBe(695);
    expect(p.hardware).toEqual([]);
  });
  it('in the slot: a 9 mm panel does not pass an 8 mm slot, and the error names the thickness', () => {
    expect(errorOf(() => bayPanel({ name: 'Side', opening, mount: 'slot', thickness_mm: 9, slot_mm: 8, profile_mm: 40 })).field).toBe('thickness_mm');
  });
  it('in the slot: an engagement deeper than the slot is refused, naming the engagement; one within it is taken', () => {
    expect(errorOf(() => bayPanel({ name: 'Side', opening, mount: 'slot', thickness_mm: 6, slot_mm: 8, profile_mm: 40, engagement_mm: 10, slotDepth_mm: 9 })).field).toBe('engagement_mm');
    // 560 + 2·6 − 1 = 571 (common practice, no source: play of 1 mm in all).
    expect(bayPanel({ name: 'Side', opening, mount: 'slot', thickness_mm: 6, slot_mm: 8, profile_mm: 40, engagement_mm: 6, slotDepth_mm: 9 }).part.length_mm).toBeCloseTo(571, 9);
  });
  it('surface-mounted: covers the members, 640 × 760, with ⌈640/300⌉·2 + ⌈760/300⌉·2 = 12 screws and drop-in T-nuts', () => {
    const p = bayPanel({ name: 'Side', opening, mount: 'surface', thickness_mm: 15, slot_mm: 8, profile_mm: 40 });
    expect(p.part.length_mm).toBe(640);
    expect(p.part.width_mm).toBe(760);
    expect(p.screws).toBe(12);
    expect(p.hardware.find((h) => h.item === 'T-nut, drop-in')?.qty).toBe(12);
  });
});

describe('countertop', () => {
  it('run 1200 × 560 with 25 mm front and 10 mm left overhang; sink 400 × 350 at (700, 80), 3 mm clearance', () => {
    const c = countertop({ run: { length_mm: 1200, depth_mm: 560 }, overhang: { front_mm: 25, back_mm: 0, left_mm: 10, right_mm: 0 }, sink: { x_mm: 700, y_mm: 80, w_mm: 400, d_mm: 350 }, clearance_mm: 3 });
    expect(c.part.length_mm).toBe(1210);
    expect(c.part.width_mm).toBe(585);
    expect(c.cutout).toEqual({ x_mm: 707, y_mm: 102, length_mm: 406, width_mm: 356 });
  });
  it('a sink close to the front edge: web 25 + 10 − 3 = 32 mm, said in the reader’s unit (32 / 25.4 = 1.26 in → 1 1/4" to 1/16)', () => {
    const input = { run: { length_mm: 1200, depth_mm: 560 }, overhang: { front_mm: 25, back_mm: 0, left_mm: 0, right_mm: 0 }, sink: { x_mm: 400, y_mm: 10, w_mm: 400, d_mm: 350 }, clearance_mm: 3 };
    expect(countertop(input).notes.find((n) => n.startsWith('Only'))).toBe('Only 32 mm of top left in front of or behind the sink: it may crack there.');
    const inches = countertop(input, (mm) => lengthText(mm, { display: 'in', frac: 16 })).notes.find((n) => n.startsWith('Only'));
    expect(inches).toBe('Only 1 1/4" of top left in front of or behind the sink: it may crack there.');
  });
  it('the frame’s notes follow its unit: the example galley’s sink moved to 20 mm from the front leaves 20 + 20 − 3 = 37 mm (1 7/16" to 1/16)', () => {
    // scripts/examples/side-galley-spec.json (invented): 20 mm front overhang and 3 mm clearance are the defaults.
    const spec = parseCabinetSpec(JSON.parse(readFileSync(new URL('../../../scripts/examples/side-galley-spec.json', import.meta.url), 'utf8')));
    const doc = buildCabinetRun(spec);
    const near = { ...doc, modules: doc.modules.map((m) => (m.kind === 'sink' ? { ...m, place: { ...m.place, y: { datum: 'front', offset_mm: 20 } } } : m)) } as typeof doc;
    const note = (d: typeof doc) => reportWithSheetGoods(d).goods?.notes.find((n) => n.startsWith('Only'));
    expect(note(near)).toBe('Only 37 mm of top left in front of or behind the sink: it may crack there.');
    expect(note({ ...near, units: { ...near.units, display: 'in' } })).toBe('Only 1 7/16" of top left in front of or behind the sink: it may crack there.');
  });
  it('a sink past the end of the run is refused', () => {
    expect(errorOf(() => countertop({ run: { length_mm: 600, depth_mm: 560 }, sink: { x_mm: 400, y_mm: 80, w_mm: 400, d_mm: 350 } })).field).toBe('sink');
  });
});

describe('drawer faces (gaps and overlay are common practice, no source)', () => {
  it('inset, three faces 1:1:2 in a 500 × 600 opening, 3 mm gaps: 494 wide, (600 − 4·3) split 147, 147, 294', () => {
    const { faces, hardware } = drawerFaces({ opening: { width_mm: 500, height_mm: 600 }, style: 'inset', shares: [1, 1, 2], gap_mm: 3 });
    expect(faces.map((f) => f.width_mm)).toEqual([494, 494, 494]);
    expect(faces.map((f) => f.height_mm)).toEqual([147, 147, 294]);
    expect(faces[2].bottom_mm).toBeCloseTo(3, 9);
    expect(hardware[0].qty).toBe(12);
  });
  it('overlay 15 mm: 530 wide, (600 + 30 − 2·3) split 156, 156, 312', () => {
    const { faces } = drawerFaces({ opening: { width_mm: 500, height_mm: 600 }, style: 'overlay', shares: [1, 1, 2], gap_mm: 3, overlay_mm: 15 });
    expect(faces.map((f) => f.width_mm)).toEqual([530, 530, 530]);
    expect(faces.map((f) => f.height_mm)).toEqual([156, 156, 312]);
    expect(faces[2].bottom_mm).toBeCloseTo(-15, 9);
  });
});

describe('mass from sheet density (densities typical [M], REFERENCES.md)', () => {
  it('1000 × 500 × 12 mm at 680 kg/m³ = 0.006 m³ × 680 = 4.08 kg', () => {
    expect(partMass_kg(1000, 500, 12, 680)).toBeCloseTo(4.08, 9);
  });
  it('every preset density is marked typical and lies in the REFERENCES.md ranges', () => {
    for (const m of SHEET_MATERIALS) {
      expect(m.typical).toBe(true);
      expect(m.density_kg_m3).toBeGreaterThanOrEqual(450);
      expect(m.density_kg_m3).toBeLessThanOrEqual(800);
    }
  });
});
