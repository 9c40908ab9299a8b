import { describe, expect, it } from 'vitest';
import { computeReport, type FrameReport } from '@shared/engine/report';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import type { FrameDocument } from '@shared/model/frame-document';
import { galleyDoc, galleySpec } from '../editing/cabinet-fixtures';

const mod = (r: FrameReport, id: string) => r.modules.find((m) => m.id === id) as FrameReport['modules'][number];
const member = (r: FrameReport, id: string) => r.members.find((m) => m.id === id) as FrameReport['members'][number];
const resize = (doc: FrameDocument, id: string, h_mm: number): FrameDocument => ({
  ...doc,
  modules: doc.modules.map((m) => (m.id === id ? { ...m, size: { ...m.size, h_mm } } : m)),
});

describe('a cabinet layout with stacked bays (the side galley example, 40×40, seat 120, top 900, clearance 10)', () => {
  const doc = galleyDoc();
  const r = computeReport(doc);

  it('stacks each module on the one below, with the room its carrying members need, by hand', () => {
    // Shelf over the tank sits on rails: seat 120 + tank 300 + clearance 10 + rail 40 = 470.
    expect(mod(r, 'shelf').min_mm.z).toBe(470);
    // Drawer over the cooler runs on slides: 120 + cooler 480 + clearance 10 = 610.
    expect(mod(r, 'cooler-drawer').min_mm.z).toBe(610);
    // Pan drawer raised 20 above the seat, 220 tall; cutlery drawer one slide clearance (12.7) above it.
    expect(mod(r, 'drawer-low').min_mm.z).toBe(140);
    expect(mod(r, 'drawer-mid').min_mm.z).toBeCloseTo(140 + 220 + 12.7, 9);
    // The sink hangs with its top at the underside of the hangers under the top: 900 − 40 = 860.
    expect(mod(r, 'sink').max_mm.z).toBe(860);
  });

  it('gives each module in a stack the members that carry it', () => {
    expect(mod(r, 'shelf').bears_on.map((c) => c.member_id)).toEqual(['bay-tank-shelf-bearer-l', 'bay-tank-shelf-bearer-r']);
    expect(mod(r, 'sink').bears_on.map((c) => [c.member_id, c.face])).toEqual([
      ['bay-sink-sink-hanger-l', 'bottom'],
      ['bay-sink-sink-hanger-r', 'bottom'],
    ]);
    expect(mod(r, 'drawer-mid').bears_on.map((c) => c.member_id)).toEqual(['bay-sink-drawer-mid-slide-l', 'bay-sink-drawer-mid-slide-r']);
    // Slide rails at the drawer's mid-height: 372.7 + 120 / 2 = 432.7, centred.
    const slide = member(r, 'bay-sink-drawer-mid-slide-l');
    expect((slide.min_mm.z + slide.max_mm.z) / 2).toBeCloseTo(432.7, 9);
    for (const m of r.modules) expect(m.bears_on.length, m.id).toBeGreaterThan(0);
  });

  it('makes a stacked bay as wide as its widest module plus the clearances', () => {
    // Drawers 450 wide (the sink is 400) + 2 × 12.7.
    expect(r.bays.find((b) => b.id === 'bay-sink')?.width_mm).toBeCloseTo(475.4, 9);
    expect(r.bays.find((b) => b.id === 'bay-sink')?.stack_ids).toEqual(['drawer-mid', 'sink']);
  });

  it('moves what is above when a module is made taller, and nothing else', () => {
    const r1 = computeReport(resize(doc, 'tank', 350));
    expect(mod(r1, 'shelf').min_mm.z).toBe(520);
    for (const id of ['bay-tank-shelf-rail-f', 'bay-tank-shelf-bearer-l']) {
      expect(member(r1, id).min_mm.z - member(r, id).min_mm.z).toBeCloseTo(50, 9);
      expect(member(r1, id).cut_length_mm).toBe(member(r, id).cut_length_mm);
    }
    expect(member(r1, 'bay-tank-bearer-l').min_mm).toEqual(member(r, 'bay-tank-bearer-l').min_mm);
    // A taller pan drawer lifts the cutlery drawer and its slides.
    const r2 = computeReport(resize(doc, 'drawer-low', 250));
    expect(mod(r2, 'drawer-mid').min_mm.z - mod(r, 'drawer-mid').min_mm.z).toBeCloseTo(30, 9);
    expect(member(r2, 'bay-sink-drawer-mid-slide-r').min_mm.z - member(r, 'bay-sink-drawer-mid-slide-r').min_mm.z).toBeCloseTo(30, 9);
    // The pan drawer's own slides follow its mid-height: up by 15.
    expect(member(r2, 'bay-sink-slide-l').min_mm.z - member(r, 'bay-sink-slide-l').min_mm.z).toBeCloseTo(15, 9);
  });

  it('says when a stack grows into the module above it, by how much, in words', () => {
    expect(r.warnings.filter((w) => w.code === 'module-clash')).toEqual([]);
    // Cutlery drawer 400 tall: 372.7 … 772.7, into the sink hanging at 680 … 860 by 92.7 mm.
    const r1 = computeReport(resize(doc, 'drawer-mid', 400));
    expect(r1.warnings.filter((w) => w.code === 'module-clash').map((w) => w.message)).toEqual([
      '“Cutlery drawer” runs 92.7 mm into “Sink with tap”: move it, choose a smaller one, or give the frame more room there',
    ]);
  });

  it('names its members in words a builder reads, never by a record id', () => {
    for (const m of doc.members) expect(m.name, m.id).not.toMatch(/bay-|galley|cooler-drawer/);
  });
});

describe('cabinet layout input', () => {
  it('names the field at fault', () => {
    const spec = galleySpec();
    expect(() => parseCabinetSpec({ ...spec, depth_mm: 0 })).toThrow(/^depth_mm: must be more than 0/);
    expect(() => parseCabinetSpec({ ...spec, seat_mm: 950 })).toThrow(/^seat_mm: the seat must be lower/);
    expect(() => parseCabinetSpec({ ...spec, profile: 'no-such' })).toThrow(/^profile: /);
    expect(() => parseCabinetSpec({ ...spec, bays: [{ id: 'open' }] })).toThrow(/^bays\[0\]\.width_mm: an open bay needs a width/);
    expect(() => parseCabinetSpec({ ...spec, bays: Array.from({ length: 41 }, (_, i) => ({ id: `b${i}`, width_mm: 100 })) })).toThrow(/^bays: at most 40 bays/);
    const long = galleySpec();
    (long.bays[0].module as { name: string }).name = 'x'.repeat(121);
    expect(() => parseCabinetSpec(long)).toThrow(/^bays\[0\]\.module\.name: /);
  });

  it('widens the slide gap of a drawer whose clearance is more than slides usually take', () => {
    const doc = buildCabinetRun({
      name: 'wide',
      profile: '30x30-s8',
      depth_mm: 500,
      height_mm: 700,
      seat_mm: 100,
      clearance_mm: 25,
      bays: [{ id: 'b', module: { id: 'd', name: 'Deep drawer', kind: 'drawer-stack', bearing: 'side-rails', size: { w_mm: 300, d_mm: 400, h_mm: 200 }, mass_kg: 5 } }],
    });
    const r = computeReport(doc);
    expect(r.modules[0].bears_on).toHaveLength(2);
  });
});
