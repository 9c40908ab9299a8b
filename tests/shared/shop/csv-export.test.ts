import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { cutListCsv, orderListCsv, toCsv } from '@shared/shop/csv-export';
import { orderList } from '@shared/shop/order-list';
import { planCutsSync } from '@shared/planner';
import { cutList, jobs } from './fixtures';

const cells = (csv: string): string[][] => Papa.parse<string[]>(csv.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data;

describe('CSV export', () => {
  // OWASP "CSV Injection": cells beginning with = + - @ tab or carriage return are prefixed with ' and quoted.
  it.each(['=1+2', '+SUM(A1)', '-2+3', '@cmd', '\t=1', '\r=1', '=HYPERLINK("http://x")\nsecond line', '  =1', '＝1'])('escapes %j', (v) => {
    const [row] = cells(toCsv([[v]]));
    expect(row[0].startsWith("'")).toBe(true);
    expect(row[0].slice(1)).toBe(v);
  });

  it('leaves ordinary text and numbers alone, negative numbers included', () => {
    const [row] = cells(toCsv([['40×40 slot 8', 1120, -3, 'rail, front']]));
    expect(row).toEqual(['40×40 slot 8', '1120', '-3', 'rail, front']);
  });

  it('starts with a byte-order mark and ends rows with CRLF (RFC 4180)', () => {
    const csv = toCsv([['a', 'b'], ['c', 'd']]);
    expect(csv.charCodeAt(0)).toBe(0xfeff);
    expect(csv.slice(1)).toBe('a,b\r\nc,d\r\n');
  });

  it('writes one row per part mark with the cut length in mm and in the display unit', () => {
    const rows = cells(cutListCsv(cutList, { display: 'in', frac: 16 }));
    expect(rows[0][1]).toBe('Part mark');
    expect(rows.slice(1).map((r) => r[1])).toEqual(['A', 'B', 'C', 'D']);
    const b = rows.find((r) => r[1] === 'B')!;
    expect(b[2]).toBe('4');
    expect(b[3]).toBe('1120');
    // 1120 / 25.4 = 44.094 in → nearest 1/16 is 44 2/16 = 44 1/8 (25.4 mm per inch exactly, NIST)
    expect(b[4]).toBe('44 1/8"');
  });

  it('escapes a member name that looks like a formula', () => {
    const evil = { ...cutList, parts: [{ ...cutList.parts[0], members: ['=cmd|" /C calc"!A0'] }] };
    const rows = cells(cutListCsv(evil, { display: 'mm', frac: 16 }));
    expect(rows[1][7].startsWith("'=")).toBe(true);
  });

  it('writes the order list with stock bars and the cut-to-length lines', () => {
    const order = orderList(jobs.map((j) => ({ ...j, plan: planCutsSync(j.job, { timeLimitMs: 200 }) })), 'EUR', { cutFee: 1.5 });
    const rows = cells(orderListCsv(order, { display: 'mm', frac: 16 }));
    expect(rows[1]).toEqual(['stock bar', '40×40 slot 8', '6000', '6000 mm', '2', '42', '84', '']);
    expect(rows[2]).toEqual(['offcut on hand', '20×20 slot 6', '1200', '1200 mm', '1', '0', '0', '']);
    expect(rows.filter((r) => r[0] === 'cut to length').length).toBe(4);
    expect(rows.at(-2)).toEqual(['total stock bars', '', '', '', '2', '', '84', '']);
  });

  it('writes the order list lengths in fractional inches for an inch shop', () => {
    const order = orderList(jobs.map((j) => ({ ...j, plan: planCutsSync(j.job, { timeLimitMs: 200 }) })), 'EUR', { cutFee: 1.5 });
    const rows = cells(orderListCsv(order, { display: 'in', frac: 32 }));
    // 6000 mm / 25.4 = 236.2205 in → nearest 1/32 is 236 7/32 (236.21875); 1 in = 25.4 mm exactly (NIST SP 811).
    expect(rows[1][3]).toBe('236 7/32"');
    // 1120 mm = 44.0945 in → 44 3/32 (44.09375) to the nearest 1/32.
    expect(rows.find((r) => r[0] === 'cut to length' && r[2] === '1120')?.[3]).toBe('44 3/32"');
  });
});
