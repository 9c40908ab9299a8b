import { describe, expect, it } from 'vitest';
import { assignMarks, markName } from '@shared/engine/part-marks';

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
});
