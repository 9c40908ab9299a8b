import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addBay, removeBay } from '@shared/editing/bays';
import { trySwapModules } from '@shared/editing/swap';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun, type CabinetSpec } from '@shared/model/cabinet-run';
import { parseFrameDocument } from '@shared/model/parse';
import { specArb, toSpec } from './cabinet-arbitraries';

const moduleBays = (spec: CabinetSpec) => spec.bays.filter((b) => b.module).map((b) => b.module!.id);

describe('cabinet layouts (fast-check)', () => {
  it('every module of a layout bears on something: each one has the members that carry it', () => {
    fc.assert(
      fc.property(specArb, (s) => {
        const r = computeReport(parseFrameDocument(buildCabinetRun(toSpec(s))));
        for (const m of r.modules) expect(m.bears_on.length, `${m.id} (${m.bearing})`).toBeGreaterThan(0);
        expect(r.warnings.filter((w) => w.code === 'module-unsupported')).toEqual([]);
      }),
      { numRuns: 60 },
    );
  });

  it('swapping two modules twice gives the document back', () => {
    fc.assert(
      fc.property(specArb, fc.nat(), fc.nat(), (s, i, j) => {
        const spec = toSpec(s);
        const ids = moduleBays(spec);
        fc.pre(ids.length >= 2);
        const a = ids[i % ids.length];
        const b = ids[j % ids.length];
        fc.pre(a !== b);
        const doc = buildCabinetRun(spec);
        const once = trySwapModules(doc, a, b);
        expect(once.ok).toBe(true);
        if (!once.ok) return;
        const twice = trySwapModules(once.doc, a, b);
        expect(twice.ok && twice.doc).toEqual(doc);
      }),
      { numRuns: 60 },
    );
  });

  it('adding a bay anywhere and removing it again gives the document back; while added, every module still bears', () => {
    fc.assert(
      fc.property(specArb, fc.nat(), fc.boolean(), (s, k, before) => {
        const doc = buildCabinetRun(toSpec(s));
        const run = doc.runs[0];
        const ref = run.bays[k % run.bays.length].id;
        const added = addBay(doc, run.id, before ? { before: ref } : { after: ref });
        if (!added.ok) throw new Error(added.reason);
        const r = computeReport(parseFrameDocument(added.doc));
        for (const m of r.modules) expect(m.bears_on.length).toBeGreaterThan(0);
        const removed = removeBay(added.doc, added.bayId);
        expect(removed.ok && removed.doc).toEqual(doc);
      }),
      { numRuns: 40 },
    );
  });
});
