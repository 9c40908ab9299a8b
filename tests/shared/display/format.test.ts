import { describe, expect, it } from 'vitest';
import { dateText, dateTimeText, KG_PER_LB, lengthText, massPerLengthText, massText } from '@shared/display/format';

describe('figures as the reader chose them', () => {
  it('writes lengths in mm or in fractional inches (1 in = 25.4 mm exactly, NIST SP 811 B.8)', () => {
    expect(lengthText(749.3, { display: 'mm', frac: 16 })).toBe('749.3 mm');
    expect(lengthText(749.3, { display: 'in', frac: 16 })).toBe('29 1/2"');
    // 1120 / 25.4 = 44.0945 in: nearest 1/16 is 44 1/8 (44.125), nearest 1/32 is 44 3/32 (44.09375)
    expect(lengthText(1120, { display: 'in', frac: 16 })).toBe('44 1/8"');
    expect(lengthText(1120, { display: 'in', frac: 32 })).toBe('44 3/32"');
  });

  it('writes masses in kg or lb (1 lb = 0.45359237 kg exactly, NIST SP 811 B.8)', () => {
    expect(KG_PER_LB).toBe(0.45359237);
    expect(massText(12.44, { mass: 'kg' })).toBe('12.4 kg');
    // 25 kg / 0.45359237 = 55.1156 lb
    expect(massText(25, { mass: 'lb' })).toBe('55.1 lb');
    // small masses keep two decimals: 0.2 kg = 0.4409 lb
    expect(massText(0.2, { mass: 'lb' })).toBe('0.44 lb');
    expect(massText(3, {})).toBe('3 kg');
    // 1.5 kg/m × 0.3048 m/ft / 0.45359237 kg/lb = 1.008 lb/ft
    expect(massPerLengthText(1.5, { mass: 'lb' })).toBe('1.01 lb/ft');
  });

  it('writes dates in ISO 8601 by default, day first or month first when chosen', () => {
    expect(dateText('2026-12-02', {})).toBe('2026-12-02');
    expect(dateText('2026-12-02', { date: 'dmy' })).toBe('02/12/2026');
    expect(dateText('2026-12-02', { date: 'dmy-dot' })).toBe('02.12.2026');
    expect(dateText('2026-12-02', { date: 'mdy' })).toBe('12/02/2026');
    expect(dateText('not a date', { date: 'iso' })).toBe('');
    const local = new Date(2026, 11, 2, 14, 5);
    expect(dateTimeText(local, { date: 'dmy' })).toBe('02/12/2026 14:05');
  });
});
