import fc from 'fast-check';
import { create, all } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { localeUsesDecimalComma, parseForcePerLength, parseLength } from '@shared/geometry/units';
import { errorOf } from '../../support/input-error';

// Shop notations for lengths, each with its expected millimetres. 1 in = 25.4 mm and 1 ft = 12 in exactly
// (NIST; US Federal Register notice of 1 July 1959). The way a builder reads a mixed number or a negative
// compound length (−2 ft 3 in = −27 in) is common practice, no source.
const IN = 25.4;

describe('shop notations', () => {
  it.each([
    ['2 ft 3-1/2 in', (24 + 3.5) * IN], // 698.5 mm
    [`2'3-1/2"`, (24 + 3.5) * IN],
    [`2' 3 1/2"`, (24 + 3.5) * IN],
    ['29-1/2"', 29.5 * IN], // 749.3 mm
    ['29 ½ in', 29.5 * IN],
    ['29½"', 29.5 * IN],
    ['¾"', 0.75 * IN], // 19.05 mm
    ['2ft 3in', 27 * IN], // 685.8 mm
    ['1.5 m + 20 mm', 1520],
    ['1 m 20 mm', 1020],
    ['1 m 2 cm 5 mm', 1025],
    ['-2 ft 3 in', -27 * IN], // −685.8 mm, not −21 in
    [`-2'3"`, -27 * IN],
    ['-(2 ft + 3 in)', -27 * IN],
    ['-2 ft + 3 in', -21 * IN], // written as a sum, it is one
    ['3 ft - 40 mm', 36 * IN - 40],
    ['600-18', 582], // a hyphen before a whole number is a minus
    ['1200 mm / 3', 400],
    ['(600 - 2 * 18) mm', 564],
    ['.5 in', 12.7],
  ])('reads %s as %f mm', (text, mm) => {
    expect(parseLength(text)).toBeCloseTo(mm, 9);
  });

  it('reads a bare number in the unit on screen', () => {
    expect(parseLength('29 1/2', 'length', { bare: 'in' })).toBeCloseTo(749.3, 9);
    expect(parseLength('29-1/2', 'length', { bare: 'in' })).toBeCloseTo(749.3, 9);
    expect(parseLength('750', 'length', { bare: 'in' })).toBeCloseTo(750 * IN, 9);
    expect(parseLength('750 mm', 'length', { bare: 'in' })).toBe(750);
    expect(parseLength('29 1/2')).toBe(29.5); // millimetres when the screen is in millimetres
  });

  it('reads a decimal comma only where the locale writes one', () => {
    expect(parseLength('1,5 m', 'length', { decimalComma: true })).toBe(1500);
    expect(parseLength('1.5 m', 'length', { decimalComma: true })).toBe(1500);
    expect(errorOf(() => parseLength('1,5 m')).message).toMatch(/comma.*point/);
    expect(errorOf(() => parseLength('1,200 mm')).message).toMatch(/comma/);
    expect(localeUsesDecimalComma('de-DE')).toBe(true);
    expect(localeUsesDecimalComma('en-US')).toBe(false);
  });

  it.each([
    ['1 m 20', /reads as "1 m" and then a bare "20".*type "1 m \+ 20 mm"/],
    ['5 ft 3', /reads as "5 ft" and then a bare "3".*type "5 ft \+ 3 in"/],
    ['1 1/2 1/4 in', /reads as "1 1\/2" and then "1\/4", two numbers side by side/],
    ['1 2 mm', /two numbers side by side/],
    ['3 in 2 ft', /larger unit first/],
    ['1 3/2 in', /fraction of one or more/],
    ['1e299 m', /far too large/],
    ['9'.repeat(30) + ' mm', /far too large/],
    ['((((((((((((((((((((((1))))))))))))))))))))) mm', /too many brackets/],
    ['-'.repeat(150) + '1 mm', /too many signs/],
    ['3 ft + 4', /bare number to a quantity with a unit/],
    ['2 ft * 3 in', /area/],
    ['25 kg', /mass/],
    ['4 mm)', /not understood/],
    ['(4 mm', /not closed/],
    ['4 mm +', /ends too early/],
  ])('refuses %j, saying how it was read and what to type', (text, why) => {
    const e = errorOf(() => parseLength(text, 'Rail length'));
    expect(e.field).toBe('Rail length');
    expect(e.message).toMatch(why);
    expect(e.message).toContain('expected a length such as');
  });

  it('reads loads per length through the same reader', () => {
    expect(parseForcePerLength('2 N/mm')).toBe(2);
    expect(parseForcePerLength('1 kN/m')).toBe(1);
  });
});

// A general-purpose reference: mathjs evaluates plain sums and products of metric and inch lengths the same way.
describe('agrees with mathjs on plain expressions', () => {
  const math = create(all, { number: 'number' });
  const unit = fc.constantFrom(['mm', 'mm'], ['m', 'm'], ['cm', 'cm'], ['in', 'inch'], ['ft', 'ft']);
  const term = fc.tuple(fc.integer({ min: 0, max: 5000 }), unit);
  it('for sums and differences of lengths with units', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.constantFrom('+', '-'), term), { minLength: 1, maxLength: 4 }), (parts) => {
        const ours = parts.map(([op, [n, [u]]], i) => `${i === 0 && op === '+' ? '' : op} ${n} ${u}`).join(' ');
        const theirs = parts.map(([op, [n, [, u]]], i) => `${i === 0 && op === '+' ? '' : op} ${n} ${u}`).join(' ');
        const expected = (math.evaluate(theirs) as { toNumber(u: string): number }).toNumber('mm');
        return Math.abs(parseLength(ours) - expected) < 1e-6;
      }),
    );
  });
});
