import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  MM_PER_INCH,
  formatLength,
  parseForce,
  parseForcePerLength,
  parseLength,
  parseMass,
  toFractionalInches,
} from '@shared/geometry/units';
import { errorOf } from '../../support/input-error';

// 1 in = 25.4 mm exactly: NIST, and the US Federal Register notice of 1 July 1959 (REFERENCES.md [S]).
// 1 ft = 12 in and 1 lb = 0.45359237 kg exactly: the same 1959 international yard and pound agreement.
// Standard gravity 9.80665 m/s² exactly (3rd CGPM, 1901); 1 lbf = 0.45359237 kg × 9.80665 m/s² (NIST SP 811).
const LB_KG = 0.45359237;
const G0 = 9.80665;
const LBF_N = LB_KG * G0;

describe('parseLength', () => {
  it('uses exactly 25.4 mm per inch', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(parseLength('1 in')).toBe(25.4);
    expect(parseLength('1"')).toBe(25.4);
  });

  it.each([
    ['750 mm', 750],
    ['750', 750], // a bare number is millimetres
    ['1.2 m', 1200],
    ['29 1/2 in', 29.5 * 25.4], // 749.3 mm
    ['16 31/32 in', (16 + 31 / 32) * 25.4], // 431.00625 mm
    ['16 31/32"', (16 + 31 / 32) * 25.4],
    ['3 ft - 40 mm', 3 * 12 * 25.4 - 40], // 874.4 mm
    ['3 ft - 20 mm', 894.4], // 914.4 − 20
    ['2 * 450mm', 900],
    [`5' 3"`, 63 * 25.4], // 1600.2 mm
    [`5'3"`, 63 * 25.4],
    ['5 ft 3 in', 63 * 25.4],
    ['1 1/2 ft', 18 * 25.4],
    ['(600 - 2 * 18) mm', 564],
    ['-12 mm', -12],
    ['3/4 in', 19.05],
  ])('reads %s as %f mm', (text, mm) => {
    expect(parseLength(text)).toBeCloseTo(mm, 9);
  });

  it('reads "29 1/2" as a mixed number, not as 29 × 1/2', () => {
    expect(parseLength('29 1/2 in')).toBe(749.3);
    expect(parseLength('29 1/2 in')).not.toBeCloseTo(14.5 * 25.4, 3);
  });

  it.each([['25 kg'], ['abc'], [''], ['   '], ['mm'], ['1/0'], ['3 ft to mm'], ['sqrt(4) mm'], ['2 mm * 3 mm'], ['5 N'], ['x = 3']])(
    'rejects %j with an InputError naming the field',
    (text) => {
      const e = errorOf(() => parseLength(text, 'span'));
      expect(e.field).toBe('span');
      expect(e.message).toContain('span');
    },
  );

  it('says what was wrong with a quantity of the wrong kind', () => {
    expect(errorOf(() => parseLength('25 kg', 'height')).message).toMatch(/height.*mass/);
  });

  it('defaults the field name to "length"', () => {
    expect(errorOf(() => parseLength('kg')).field).toBe('length');
  });
});

describe('parseForce, parseMass, parseForcePerLength', () => {
  it('reads forces in newtons', () => {
    expect(parseForce('500 N')).toBe(500);
    expect(parseForce('500')).toBe(500);
    expect(parseForce('112 lbf')).toBeCloseTo(112 * LBF_N, 6); // ≈ 498.2 N
    expect(parseForce('25 kgf')).toBeCloseTo(25 * G0, 9); // 245.16625 N
    expect(parseForce('0.5 kN')).toBe(500);
  });

  it('takes a mass given as a load as its weight under standard gravity', () => {
    expect(parseForce('25 kg')).toBeCloseTo(25 * G0, 9);
    expect(parseForce('55 lb')).toBeCloseTo(55 * LB_KG * G0, 9);
  });

  it('reads masses in kilograms', () => {
    expect(parseMass('25 kg')).toBe(25);
    expect(parseMass('55 lb')).toBeCloseTo(55 * LB_KG, 9); // 24.94758035 kg
    expect(parseMass('500 g')).toBe(0.5);
  });

  it('reads loads per length in N/mm', () => {
    expect(parseForcePerLength('2 N/mm')).toBe(2);
    expect(parseForcePerLength('100 N/m')).toBeCloseTo(0.1, 12);
    expect(parseForcePerLength('10 lbf/in')).toBeCloseTo((10 * LBF_N) / 25.4, 9);
    expect(parseForcePerLength('6 kg/m')).toBeCloseTo((6 * G0) / 1000, 12);
  });

  it('names the field when the kind is wrong', () => {
    expect(errorOf(() => parseForce('3 m', 'load')).field).toBe('load');
    expect(errorOf(() => parseMass('3 N', 'module mass')).message).toContain('module mass');
    expect(errorOf(() => parseForcePerLength('3 N', 'udl')).field).toBe('udl');
  });
});

describe('formatLength and toFractionalInches', () => {
  it('prints millimetres to one decimal without a trailing .0', () => {
    expect(formatLength(749.3, 'mm')).toBe('749.3 mm');
    expect(formatLength(750, 'mm')).toBe('750 mm');
    expect(formatLength(749.34, 'mm')).toBe('749.3 mm');
    expect(formatLength(749.36, 'mm')).toBe('749.4 mm');
    expect(formatLength(-0.01, 'mm')).toBe('0 mm');
  });

  it('rounds to the nearest 1/16 or 1/32 inch, in lowest terms', () => {
    // 749.3 mm = 29.5 in exactly.
    expect(formatLength(749.3, 'in')).toBe('29 1/2"');
    // 430 mm / 25.4 = 16.92913 in. ×16 = 270.87 → 271/16 = 16 15/16. ×32 = 541.73 → 542/32 = 16 30/32 = 16 15/16.
    expect(formatLength(430, 'in', 16)).toBe('16 15/16"');
    expect(formatLength(430, 'in', 32)).toBe('16 15/16"');
    // 429.5 mm / 25.4 = 16.90945 in. ×16 = 270.55 → 271 → 16 15/16. ×32 = 541.10 → 541 → 16 29/32.
    expect(formatLength(429.5, 'in', 16)).toBe('16 15/16"');
    expect(formatLength(429.5, 'in', 32)).toBe('16 29/32"');
    // 16 31/32 in = 431.00625 mm.
    expect(formatLength(431.00625, 'in', 32)).toBe('16 31/32"');
    expect(formatLength(25.4 / 16, 'in')).toBe('1/16"');
    expect(formatLength(304.8, 'in')).toBe('12"');
    expect(formatLength(12.7, 'in', 32)).toBe('1/2"');
    expect(formatLength(0.1, 'in')).toBe('0"');
    expect(formatLength(-19.05, 'in')).toBe('-3/4"');
  });

  it('gives the parts of the fraction', () => {
    expect(toFractionalInches(431.00625, 32)).toEqual({ negative: false, whole: 16, num: 31, den: 32, inches: 16.96875, text: '16 31/32"' });
    expect(toFractionalInches(12.7, 32)).toMatchObject({ whole: 0, num: 1, den: 2, inches: 0.5 });
  });

  it('is never further than half a step from the exact value, and reads back as what it says', () => {
    fc.assert(
      fc.property(fc.double({ min: -5000, max: 5000, noNaN: true }), fc.constantFrom(16 as const, 32 as const), (mm, frac) => {
        const f = toFractionalInches(mm, frac);
        const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
        const lowest = f.num === 0 ? f.den === 1 : gcd(f.num, f.den) === 1 && frac % f.den === 0;
        const back = parseLength(f.text);
        return Math.abs(f.inches - mm / 25.4) <= 0.5 / frac + 1e-9 && lowest && Math.abs(back - f.inches * 25.4) < 1e-6;
      }),
    );
  });

  it('millimetre text reads back within 0.05 mm', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }), (mm) => Math.abs(parseLength(formatLength(mm, 'mm')) - mm) <= 0.05 + 1e-9),
    );
  });
});
