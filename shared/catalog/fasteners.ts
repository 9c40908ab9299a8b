import type { Fastener } from './profile-types';

/** Major diameter and pitch of the fasteners slotted profiles are made for (ISO 261 metric, ASME B1.1 UNC). */
export const FASTENER_THREADS: Readonly<Record<Fastener, { major_mm: number; pitch_mm: number }>> = {
  M5: { major_mm: 5, pitch_mm: 0.8 },
  M6: { major_mm: 6, pitch_mm: 1 },
  M8: { major_mm: 8, pitch_mm: 1.25 },
  '1/4-20': { major_mm: 6.35, pitch_mm: 25.4 / 20 },
  '5/16-18': { major_mm: 7.9375, pitch_mm: 25.4 / 18 },
};

/** Tap drill by the usual rule, major diameter minus pitch (see REFERENCES.md: M5 4.2, M6 5.0, M8 6.8 mm). */
export const tapDrill = (f: Fastener): number => {
  const t = FASTENER_THREADS[f];
  return Math.round((t.major_mm - t.pitch_mm) * 100) / 100;
};
