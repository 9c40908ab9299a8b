import { describe, expect, it } from 'vitest';
import { assignMarks, markName, pinMarks } from '@shared/engine/part-marks';
import { computeReport } from '@shared/engine/report';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { resizeModule } from './relay-helpers';

describe('part marks', () => {
  it('run A … Z, AA, AB … (like spreadsheet columns)', () => {
    expect([0, 1, 25, 26, 27, 51, 52, 701, 702].map(markName)).toEqual(['A', 'B', 'Z', 'AA', 'AB', 'AZ', 'BA', 'ZZ', 'AAA']);
  });

  it('without history, follow the order groups first appear', () => {
    expect(assignMarks([{ members: ['a'], cut_length_mm: 1 }, { members: ['b', 'c'], cut_length_mm: 2 }], new Map())).toEqual(['A', 'B']);
  });

  it('when a group splits, the part that kept its length keeps the mark and the other gets an unused one', () => {
    // Before: a, b, c, d were all part B (500 mm) and e part A. Now c, d are 560 mm.
    const hints = new Map(
      [
        ['e', 'A', 300],
        ['a', 'B', 500],
        ['b', 'B', 500],
        ['c', 'B', 500],
        ['d', 'B', 500],
      ].map(([id, mark, len]) => [id as string, { mark: mark as string, pinned: false, cut_length_mm: len as number }]),
    );
    const marks = assignMarks(
      [
        { members: ['c', 'd'], cut_length_mm: 560 },
        { members: ['a', 'b'], cut_length_mm: 500 },
        { members: ['e'], cut_length_mm: 300 },
      ],
      hints,
    );
    expect(marks).toEqual(['C', 'B', 'A']);
  });

  it('a pinned mark wins over carried ones', () => {
    const hints = new Map([
      ['a', { mark: 'B', pinned: false }],
      ['b', { mark: 'B', pinned: false }],
      ['c', { mark: 'Q', pinned: true }],
    ]);
    expect(assignMarks([{ members: ['a', 'b', 'c'], cut_length_mm: 1 }], hints)).toEqual(['Q']);
  });

  it('pinned into the document, marks carried through a re-lay hold without the previous report', () => {
    const doc = demoFrameDocument();
    const r0 = computeReport(doc);
    // Make the tank as wide as the cooler: its bay rails become 480 mm like the cooler's and the two groups merge.
    const relaid = resizeModule(doc, 'tank', { w_mm: 460 });
    const carried = computeReport(relaid, { previous: r0 });
    const mark = (r: typeof r0, id: string) => r.members.find((m) => m.id === id)?.mark;
    // Carried: the merged group keeps the cooler rails' mark (same length as before), the cooktop rails keep theirs.
    expect(mark(carried, 'bay-tank-top-f')).toBe(mark(r0, 'bay-cooler-top-f'));
    expect(mark(carried, 'bay-cooktop-top-f')).toBe(mark(r0, 'bay-cooktop-top-f'));
    // Fresh marks (no history) close the gap the merge left, so the cooktop rails would change letter …
    expect(mark(computeReport(relaid), 'bay-cooktop-top-f')).not.toBe(mark(r0, 'bay-cooktop-top-f'));
    // … unless the carried marks are pinned in the document.
    const pinned = computeReport(pinMarks(relaid, carried));
    expect(pinned.members.map((m) => m.mark)).toEqual(carried.members.map((m) => m.mark));
  });
});
