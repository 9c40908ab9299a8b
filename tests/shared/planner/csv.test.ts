import { describe, expect, it } from 'vitest';
import { parsePartsCsv, parseStockCsv } from '../../../shared/planner/csv';

describe('quick planner lists', () => {
  it('reads parts with a header, mixed separators and a default quantity', () => {
    expect(parsePartsCsv('length,qty,label\n1200,4,A\n650;2;B\n\n# note\n400')).toEqual([
      { length: 1200, qty: 4, label: 'A' },
      { length: 650, qty: 2, label: 'B' },
      { length: 400, qty: 1, label: 'L6' },
    ]);
  });
  it('reads stock with a blank quantity as unlimited', () => {
    expect(parseStockCsv('6000,30,\n1500,0,2,shelf')).toEqual([
      { length: 6000, price: 30, qty: null },
      { length: 1500, price: 0, qty: 2, label: 'shelf' },
    ]);
  });
  it('names the line and field at fault', () => {
    expect(() => parsePartsCsv('1200,4,A\nabc,1,B')).toThrow('line 2: length "abc" is not a number');
    expect(() => parsePartsCsv('1200,2.5,A')).toThrow('line 1: quantity must be a whole number (got 2.5)');
    expect(() => parseStockCsv('-6000,30')).toThrow('line 1: length must be positive (got -6000)');
  });
});
