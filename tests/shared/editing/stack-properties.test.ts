import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { moveBay } from '@shared/editing/bays';
import type { EditOutcome } from '@shared/editing/outcome';
import { addToStack, removeFromStack, swapInStack } from '@shared/editing/stack';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun } from '@shared/model/cabinet-run';
import type { FrameDocument } from '@shared/model/frame-document';
import { parseFrameDocument } from '@shared/model/parse';
import { bayModuleIds } from '@shared/model/run';
import { moduleArb, specArb, toSpec } from './cabinet-arbitraries';

const ok = <X>(r: EditOutcome<X>) => {
  if (!r.ok) throw new Error(`refused: ${r.reason}`);
  return r;
};

/** Every module bears on at least one member, and nothing is reported unsupported. */
function everyModuleBears(doc: FrameDocument): void {
  const r = computeReport(parseFrameDocument(doc));
  for (const m of r.modules) expect(m.bears_on.length, `${m.id} (${m.bearing})`).toBeGreaterThan(0);
  expect(r.warnings.filter((w) => w.code === 'module-unsupported')).toEqual([]);
}

describe('stack edits and reordering (fast-check)', () => {
  it('two modules of one stack swapped: every module bears; swapped twice, the document is back', () => {
    fc.assert(
      fc.property(specArb, fc.nat(), fc.nat(), fc.nat(), (s, k, i, j) => {
        const doc = buildCabinetRun(toSpec(s));
        const stacked = doc.runs[0].bays.filter((b) => bayModuleIds(b).length >= 2);
        fc.pre(stacked.length > 0);
        const ids = bayModuleIds(stacked[k % stacked.length]);
        const [a, b] = [ids[i % ids.length], ids[j % ids.length]];
        fc.pre(a !== b);
        const once = ok(swapInStack(doc, a, b));
        everyModuleBears(once.doc);
        expect(ok(swapInStack(once.doc, a, b)).doc).toEqual(doc);
      }),
      { numRuns: 40 },
    );
  });

  it('a module added anywhere in a bay bears, so does every other; removing it gives the document back (or a refusal: the bay is too narrow)', () => {
    fc.assert(
      fc.property(specArb, moduleArb(fc.constantFrom('base' as const, 'side-rails' as const)), fc.nat(), fc.nat(), fc.constantFrom('above', 'below', 'top'), (s, m, k, i, how) => {
        const doc = buildCabinetRun(toSpec(s));
        const bay = doc.runs[0].bays[k % doc.runs[0].bays.length];
        const ids = bayModuleIds(bay);
        const ref = ids[i % Math.max(1, ids.length)];
        const where = how === 'top' || ref === undefined ? 'top' : how === 'above' ? { above: ref } : { below: ref };
        const input = { name: 'Added', kind: m.kind, bearing: m.bearing, size: { w_mm: m.w, d_mm: m.d, h_mm: m.h }, mass_kg: m.mass };
        const added = addToStack(doc, bay.id, input, where);
        const tooNarrow = bay.width_mm !== undefined && bay.width_mm < Math.max(m.w, ...ids.map((id) => doc.modules.find((x) => x.id === id)!.size.w_mm)) + 2 * (bay.clearance_mm ?? s.clearance);
        if (tooNarrow && ids.length > 0) {
          expect(added.ok).toBe(false);
          return;
        }
        everyModuleBears(ok(added).doc);
        const removed = ok(removeFromStack(ok(added).doc, ok(added).moduleId)).doc;
        // An open bay too narrow for the module followed it, and keeps the width it took.
        if (tooNarrow) expect({ ...removed, runs: doc.runs }).toEqual(doc);
        else expect(removed).toEqual(doc);
      }),
      { numRuns: 40 },
    );
  });

  it('a bay moved anywhere along the run: every module still bears; moved back, the document is back', () => {
    fc.assert(
      fc.property(specArb, fc.nat(), fc.nat(), (s, k, to) => {
        const doc = buildCabinetRun(toSpec(s));
        const bays = doc.runs[0].bays;
        const bay = bays[k % bays.length];
        const moved = ok(moveBay(doc, bay.id, to % bays.length));
        everyModuleBears(moved.doc);
        expect(ok(moveBay(moved.doc, bay.id, k % bays.length)).doc).toEqual(doc);
      }),
      { numRuns: 40 },
    );
  });
});
