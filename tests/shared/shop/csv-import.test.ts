import { describe, expect, it } from 'vitest';
import { readCsv } from '@shared/shop/csv-import';
import { parseOffcutsCsv } from '@shared/shop/offcut-import';
import { parseProfilesCsv, parseSize } from '@shared/shop/profile-import';

const known = (typed: string): string | null => ({ '40x40-s8': '40x40-s8', '40×40 slot 8': '40x40-s8', '20x20-s6': '20x20-s6' })[typed] ?? null;

describe('offcut import', () => {
  it('keeps good rows and lists bad ones with their line numbers and reasons', () => {
    const csv = ['profile,length,quantity', '40x40-s8,1200,2', '99x99,800,1', '20x20-s6,-5,1', '', '40×40 slot 8,47 1/4 in,', '20x20-s6,300,1.5', '40x40-s8,1.2 m,3'].join('\n');
    const r = parseOffcutsCsv(csv, known);
    expect(r.rows).toEqual([
      { line: 2, value: { profileId: '40x40-s8', length_mm: 1200, qty: 2 } },
      // 47.25 in × 25.4 mm/in (exact, NIST) = 1200.15 mm; blank quantity means one piece
      { line: 6, value: { profileId: '40x40-s8', length_mm: 1200.15, qty: 1 } },
      { line: 8, value: { profileId: '40x40-s8', length_mm: 1200, qty: 3 } },
    ]);
    expect(r.errors.map((e) => e.line)).toEqual([3, 4, 7]);
    expect(r.errors[0].reason).toMatch(/profile: "99x99"/);
    expect(r.errors[1].reason).toMatch(/^length:/);
    expect(r.errors[2].reason).toMatch(/quantity: must be a whole number/);
  });

  it('counts line breaks inside quoted cells when numbering lines', () => {
    const csv = 'profile,length,quantity,note\r\n40x40-s8,500,1,"two\r\nlines"\r\n40x40-s8,abc,1,x\r\n';
    const r = parseOffcutsCsv(csv, known);
    expect(r.rows).toHaveLength(1);
    expect(r.errors).toEqual([{ line: 4, reason: expect.stringMatching(/^length:/) }]);
  });

  it('reports a missing column once, on line 1', () => {
    const r = parseOffcutsCsv('profile,qty\n40x40-s8,1\n', known);
    expect(r.rows).toEqual([]);
    expect(r.errors).toEqual([{ line: 1, reason: 'missing column: length' }]);
  });

  it('accepts a byte-order mark, header case and our own escaped cells', () => {
    const r = parseOffcutsCsv("\uFEFFProfile,Length (mm),Qty\n40x40-s8,'-5,1\n", known);
    expect(r.errors[0].reason).toMatch(/^length:/);
  });

  it('reads an empty file as one error', () => {
    expect(readCsv('', [{ key: 'a', names: ['a'], required: true }], (x) => x).errors).toHaveLength(1);
  });
});

describe('custom profile import', () => {
  it('reads size and section figures, rejecting impossible rows', () => {
    const csv = [
      'name,size,area_mm2,Ix_mm4,Iy_mm4,mass_kg_per_m',
      'Shop 40 light,40x40,430,68000,68000,1.16',
      'Too big area,20x20,500,1000,1000,1',
      'Bad size,40 by 40,430,68000,68000,1.16',
      'Shop 40 light,40x40,430,68000,68000,1.16',
      'Inch one,1.5x1.5 in,600,1,1,1.6',
    ].join('\n');
    const r = parseProfilesCsv(csv);
    expect(r.rows.map((x) => x.value.name)).toEqual(['Shop 40 light', 'Inch one']);
    // 1.5 in = 38.1 mm (25.4 mm per inch exactly, NIST)
    expect(r.rows[1].value.width_mm).toBeCloseTo(38.1, 9);
    expect(r.errors.map((e) => [e.line, e.reason.split(':')[0]])).toEqual([
      [3, 'area_mm2'],
      [4, 'size'],
      [5, 'name'],
    ]);
  });

  it('parses sizes with the multiplication sign and a unit', () => {
    expect(parseSize('40 × 80 mm')).toEqual({ width_mm: 40, height_mm: 80 });
    expect(() => parseSize('40')).toThrow(/size/);
  });
});

describe('offcut import in the workshop unit', () => {
  const known = (t: string) => (t === '40x40-s8' ? t : null);
  // 1 in = 25.4 mm exactly (NIST SP 811, B.8)
  it('reads a bare length as inches in an inch shop', () => {
    const r = parseOffcutsCsv('profile,length,qty\n40x40-s8,29 1/2,2\n40x40-s8,2 ft 3-1/2 in,1\n', known, { bare: 'in' });
    expect(r.errors).toEqual([]);
    expect(r.rows.map((x) => x.value.length_mm)).toEqual([749.3, 698.5]);
  });

  it('keeps millimetres where the header names them, and reads a quoted decimal comma when set', () => {
    const r = parseOffcutsCsv('Profile,Length (mm),Qty\n40x40-s8,750,1\n40x40-s8,"1,5 m",1\n', known, { bare: 'in', decimalComma: true });
    expect(r.rows.map((x) => x.value.length_mm)).toEqual([750, 1500]);
  });
});
