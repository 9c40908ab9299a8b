import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import type { FrameReport } from '@shared/engine/report-types';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { resizeModule, swapBays } from './relay-helpers';

const member = (r: FrameReport, id: string) => r.members.find((m) => m.id === id) as FrameReport['members'][number];

describe('re-lay of the demo pod (pantry | cooler | tank | cooktop, 30×30 uprights)', () => {
  const doc = demoFrameDocument();
  const r0 = computeReport(doc);

  it('is the example file scripts/examples/rear-kitchen-pod.json', () => {
    const file = JSON.parse(readFileSync(new URL('../../../scripts/examples/rear-kitchen-pod.json', import.meta.url), 'utf8'));
    expect(file).toEqual(doc);
  });

  it('lays out the bays by hand', () => {
    // Pantry 140 + 2 × 12.7 slide clearance = 165.4; cooler 460 + 2 × 10 = 480; tank 260 + 20 = 280;
    // cooktop 360 + 25.4 = 385.4; five 30 mm uprights: 165.4 + 480 + 280 + 385.4 + 150 = 1460.8 mm overall.
    expect(r0.bays.map((b) => b.width_mm)).toEqual([165.4, 480, 280, 385.4]);
    expect(r0.datums.find((d) => d.id === 'galley.end')?.value_mm).toBe(1460.8);
    // Upright 2 (between cooler and tank) stands at 30 + 165.4 + 30 + 480 = 705.4.
    expect(member(r0, 'galley-u2-f').min_mm.x).toBe(705.4);
  });

  it('swapping two modules of different widths moves only the upright between them; every part keeps its mark', () => {
    const swapped = swapBays(doc, 'galley', 1, 2);
    const r1 = computeReport(swapped);
    // Tank first now: upright 2 at 30 + 165.4 + 30 + 280 = 505.4, 200 mm to the left; upright 3 stays at
    // 505.4 + 30 + 480 = 1015.4 as before (the two bays together are as wide as before).
    for (const id of ['galley-u2-f', 'galley-u2-b', 'galley-x2-top', 'galley-x2-low']) {
      expect(member(r1, id).min_mm.x).toBeCloseTo(member(r0, id).min_mm.x - 200, 9);
    }
    for (const id of ['galley-u1-f', 'galley-u3-b', 'galley-u4-f', 'bay-pantry-top-f', 'bay-cooktop-slide-r']) {
      expect(member(r1, id).min_mm).toEqual(member(r0, id).min_mm);
    }
    // The cooler's own members travel with it: its bay now starts at 505.4 + 30 = 535.4 instead of 225.4.
    expect(member(r1, 'bay-cooler-bearer-l').min_mm.x).toBeCloseTo(member(r0, 'bay-cooler-bearer-l').min_mm.x + 310, 9);
    // Same ids, same lengths, same marks: nothing to re-cut.
    expect(r1.members.map((m) => [m.id, m.cut_length_mm, m.mark])).toEqual(r0.members.map((m) => [m.id, m.cut_length_mm, m.mark]));
    expect(r1.cut_list).toEqual(r0.cut_list);
  });

  it('swapping back gives the identical report', () => {
    const back = swapBays(swapBays(doc, 'galley', 1, 2), 'galley', 1, 2);
    expect(computeReport(back)).toEqual(r0);
    // … also when each report carries the marks of the one before.
    const r1 = computeReport(swapBays(doc, 'galley', 0, 3), { previous: r0 });
    expect(computeReport(swapBays(swapBays(doc, 'galley', 0, 3), 'galley', 0, 3), { previous: r1 })).toEqual(r0);
  });

  it('resizing a module moves the uprights beyond it and re-cuts only its bay’s rails', () => {
    const r1 = computeReport(resizeModule(doc, 'cooler', { w_mm: 500 }), { previous: r0 });
    // Cooler bay 500 + 20 = 520: its four rails go from 480 to 520; uprights 2–4 move 40 mm right.
    for (const id of ['bay-cooler-top-f', 'bay-cooler-top-b', 'bay-cooler-low-f', 'bay-cooler-low-b']) {
      expect(member(r0, id).cut_length_mm).toBe(480);
      expect(member(r1, id).cut_length_mm).toBe(520);
      expect(member(r1, id).mark).toBe(member(r0, id).mark);
    }
    expect(member(r1, 'galley-u3-f').min_mm.x).toBeCloseTo(member(r0, 'galley-u3-f').min_mm.x + 40, 9);
    expect(member(r1, 'galley-u1-f').min_mm.x).toBe(member(r0, 'galley-u1-f').min_mm.x);
    // Every other member keeps its length and mark.
    const others = r0.members.filter((m) => !m.id.startsWith('bay-cooler-top') && !m.id.startsWith('bay-cooler-low'));
    for (const m of others) expect([member(r1, m.id).cut_length_mm, member(r1, m.id).mark]).toEqual([m.cut_length_mm, m.mark]);
  });
});
