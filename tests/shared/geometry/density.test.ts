import { describe, expect, it } from 'vitest';
import { densityText, densityUnit } from '@shared/display/format';
import { KG_M3_PER_LB_FT3, parseDensity, parseMass } from '@shared/geometry/units';
import { errorOf } from '../../support/input-error';

// Source: the pound (0.45359237 kg) and the foot (0.3048 m) as defined by the international yard and pound agreement
// of 1959 (NIST SP 811, Appendix B.8, which lists 1 lb/ft³ = 1.601 846 E+01 kg/m³). Worked here:
// 0.45359237 / 0.3048³ = 0.45359237 / 0.028316846592 = 16.018463373960… kg/m³.
const LB_FT3 = 0.45359237 / 0.028316846592;

describe('densities in kg/m³ or lb/ft³', () => {
  it('1 lb/ft³ = 16.018463 kg/m³ (1959 pound and foot; NIST SP 811 B.8)', () => {
    expect(KG_M3_PER_LB_FT3).toBeCloseTo(16.018463, 6);
    expect(KG_M3_PER_LB_FT3).toBeCloseTo(LB_FT3, 12);
  });

  it('a bare number is in the unit on screen; a typed unit wins', () => {
    expect(parseDensity('680')).toBe(680);
    expect(parseDensity('680', 'density', { bare: 'lb/ft3' })).toBeCloseTo(680 * LB_FT3, 6);
    expect(parseDensity('42.5 lb/ft³')).toBeCloseTo(42.5 * LB_FT3, 6);
    expect(parseDensity('42.5 lb/ft3')).toBeCloseTo(42.5 * LB_FT3, 6);
    expect(parseDensity('42.5 pcf')).toBeCloseTo(42.5 * LB_FT3, 6);
    expect(parseDensity('680 kg/m³', 'density', { bare: 'lb/ft3' })).toBe(680);
    expect(parseDensity('680kg/m3', 'density', { bare: 'lb/ft3' })).toBe(680);
    // 1 g/cm³ = 1000 kg/m³ (SI prefixes: 10⁻³ kg / 10⁻⁶ m³).
    expect(parseDensity('0.68 g/cm³')).toBeCloseTo(680, 9);
    expect(parseDensity('40 + 2.5', 'density', { bare: 'lb/ft3' })).toBeCloseTo(42.5 * LB_FT3, 6);
    expect(parseDensity('680,5', 'density', { decimalComma: true })).toBe(680.5);
  });

  it('what is not a density is refused, naming the field', () => {
    expect(errorOf(() => parseDensity('680 kg', 'birch density')).field).toBe('birch density');
    expect(errorOf(() => parseDensity('680 kg', 'birch density')).message).toMatch(/is a mass; expected a density/);
    expect(errorOf(() => parseDensity('kg/m³', 'd')).message).toMatch(/no number/);
    expect(errorOf(() => parseDensity('', 'd')).message).toMatch(/no value/);
  });

  it('writes kg/m³ to the nearest 1 and lb/ft³ to the nearest 0.1, by the mass unit on screen', () => {
    expect(densityText(680, { mass: 'kg' })).toBe('680 kg/m³');
    // 680 / 16.018463 = 42.451 lb/ft³
    expect(densityText(680, { mass: 'lb' })).toBe('42.5 lb/ft³');
    expect(densityText(42 * LB_FT3, { mass: 'lb' })).toBe('42 lb/ft³');
    expect(densityUnit({ mass: 'lb' })).toBe('lb/ft3');
    expect(densityUnit({})).toBe('kg/m3');
    // What is shown reads back as the same figure.
    for (const v of [500, 680, 750]) {
      const shown = densityText(v, { mass: 'lb' });
      expect(densityText(parseDensity(shown, 'd', { bare: 'lb/ft3' }), { mass: 'lb' })).toBe(shown);
    }
  });
});

describe('masses typed with a bare number', () => {
  it('are in pounds where pounds are on screen (1 lb = 0.45359237 kg exactly, 1959 agreement)', () => {
    expect(parseMass('40', 'mass', { bare: 'lb' })).toBeCloseTo(40 * 0.45359237, 9);
    expect(parseMass('40')).toBe(40);
    expect(parseMass('18 kg', 'mass', { bare: 'lb' })).toBe(18);
  });
});
