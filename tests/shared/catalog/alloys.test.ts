import { describe, expect, it } from 'vitest';
import { ALLOYS, ALLOY_IDS, isAlloyId } from '@shared/catalog/alloys';

// Values from REFERENCES.md. 1 ksi = 6.894757 MPa (NIST SP 811 conversion factor).
const KSI = 6.894757;

describe('ALLOYS', () => {
  it('holds the three tempers the catalogue uses', () => {
    expect(ALLOY_IDS.sort()).toEqual(['6061-T6', '6063-T5', '6063-T6']);
    expect(isAlloyId('6063-T5')).toBe(true);
    expect(isAlloyId('7075-T6')).toBe(false);
  });

  it('typical values match MatWeb (Aluminum Association typical values) [H]', () => {
    const typical = {
      '6063-T5': [145, 186],
      '6063-T6': [214, 241],
      '6061-T6': [276, 310],
    } as const;
    for (const id of ALLOY_IDS) {
      const a = ALLOYS[id];
      expect(a.E_MPa).toBe(68_900); // 68.9 GPa (10,000 ksi)
      expect(a.density_kg_m3).toBe(2_700); // 2.70 g/cm³
      expect([a.typical_yield_MPa, a.typical_ultimate_MPa]).toEqual(typical[id]);
      expect(a.source).toMatch(/MatWeb/);
    }
  });

  it('6063-T5 design minimums are Aluminum Design Manual Table A.3.4: Fty 16 ksi, Ftu 22 ksi [S]', () => {
    const a = ALLOYS['6063-T5'];
    expect(a.yield_MPa).toBeCloseTo(16 * KSI, 0); // 110 MPa
    expect(a.ultimate_MPa).toBeCloseTo(22 * KSI, 0); // 152 MPa
    expect(a.yield_MPa).toBe(110);
    expect(a.source).toMatch(/Aluminum Design Manual Table A\.3\.4/);
  });

  it('6061-T6 design minimums are Aluminum Design Manual Table A.3.4: Fty 35 ksi, Ftu 38 ksi [S]', () => {
    const a = ALLOYS['6061-T6'];
    expect(Math.abs(a.yield_MPa - 35 * KSI)).toBeLessThan(0.5);
    expect(Math.abs(a.ultimate_MPa - 38 * KSI)).toBeLessThan(0.5);
    expect(a.source).toMatch(/Aluminum Design Manual/);
  });

  it('6063-T6 design minimums are EN 755-2 thin walls: Rp0.2 170 MPa, Rm 215 MPa [S]', () => {
    const a = ALLOYS['6063-T6'];
    expect([a.yield_MPa, a.ultimate_MPa]).toEqual([170, 215]);
    expect(a.source).toMatch(/EN 755-2/);
  });

  it('design minimums sit below the typical values', () => {
    for (const id of ALLOY_IDS) {
      expect(ALLOYS[id].yield_MPa).toBeLessThan(ALLOYS[id].typical_yield_MPa);
      expect(ALLOYS[id].ultimate_MPa).toBeLessThan(ALLOYS[id].typical_ultimate_MPa);
    }
  });

  it('shear modulus is the EN 1999-1-1 value, recalled [M]', () => {
    for (const id of ALLOY_IDS) expect(ALLOYS[id].G_MPa).toBe(27_000);
  });
});
