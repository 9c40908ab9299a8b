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
    expect(() => parsePartsCsv('1200,4,A\nabc,1,B')).toThrow(/^line 2: .*abc/);
    expect(() => parsePartsCsv('1200,2.5,A')).toThrow('line 1: quantity must be a whole number (got 2.5)');
    expect(() => parseStockCsv('-6000,30')).toThrow('line 1: length must be positive (got -6000)');
  });
});

describe('quick planner lists in the unit on screen', () => {
  // 1 in = 25.4 mm exactly (NIST SP 811, B.8); 1 ft = 304.8 mm.
  it('reads bare numbers as inches in an inch shop, and shop notation in any', () => {
    const parts = parsePartsCsv('length,qty,label\n29 1/2,2,A\n2\' 3-1/2",1,B\n750 mm,3,C', { bare: 'in' });
    expect(parts.map((p) => p.length)).toEqual([749.3, 698.5, 750]);
  });

  it('reads a decimal comma where the setting says so, with semicolons between fields', () => {
    expect(parseStockCsv('1,5 m;12,50;\n6000;30;', { decimalComma: true })).toEqual([
      { length: 1500, price: 12.5, qty: null },
      { length: 6000, price: 30, qty: null },
    ]);
    // without the setting a comma separates fields, so "5 m" lands in the quantity and is refused there
    expect(() => parsePartsCsv('1,5 m', {})).toThrow('line 1: quantity "5 m" is not a number');
  });
});
