import type { Fastener } from './profile-types';

/**
 * Threads the slotted profiles are made for (ISO 261 metric coarse, ASME B1.1 UNC) and the drill used before
 * tapping an end bore. Tap drills follow the usual rule, major diameter minus pitch, rounded to a stock drill
 * (REFERENCES.md: M5 4.2, M6 5.0, M8 6.8 mm; 1/4-20 #7 drill 5.11 mm). 5/16-18 uses an F drill, 6.53 mm (recalled).
 */
export const FASTENER_THREADS: Readonly<Record<Fastener, { major_mm: number; pitch_mm: number; tapDrill_mm: number }>> = {
  M5: { major_mm: 5, pitch_mm: 0.8, tapDrill_mm: 4.2 },
  M6: { major_mm: 6, pitch_mm: 1, tapDrill_mm: 5 },
  M8: { major_mm: 8, pitch_mm: 1.25, tapDrill_mm: 6.8 },
  '1/4-20': { major_mm: 6.35, pitch_mm: 25.4 / 20, tapDrill_mm: 5.11 },
  '5/16-18': { major_mm: 7.9375, pitch_mm: 25.4 / 18, tapDrill_mm: 6.53 },
};

export const tapDrill = (f: Fastener): number => FASTENER_THREADS[f].tapDrill_mm;
