import { formatLength, KG_M3_PER_LB_FT3, KG_PER_LB, type DensityUnit } from '../geometry/units';
import type { DateFormat } from '../model/settings';

// The one writer of figures for people: lengths, masses and dates as the workshop or the frame chose to read them.
// The client, the server's PDFs, CSVs and e-mails all go through it, so a figure reads the same on screen and paper.

/** What a reader chose: a length unit (inches to 1/16 or 1/32), a mass unit and a date format. */
export type Readout = {
  display: 'mm' | 'in';
  frac: 16 | 32;
  mass?: 'kg' | 'lb';
  date?: DateFormat;
};

export { KG_PER_LB };

/** "749.3 mm" (nearest 0.1 mm) or `29 1/2"` (nearest 1/16 or 1/32 inch). */
export const lengthText = (mm: number, r: Readout): string => formatLength(mm, r.display, r.frac);

/** The unit a bare typed number is in, and its short name for labels ("mm", "in"). */
export const lengthUnit = (r: Readout): 'mm' | 'in' => r.display;

const round = (v: number, places: number): number => {
  const f = 10 ** places;
  const x = Math.round(v * f) / f;
  return Object.is(x, -0) ? 0 : x;
};

/** "12.4 kg" or "27.3 lb", to 0.1 (0.01 below 10, so a bracket's mass still shows). */
export function massText(kg: number, r: Pick<Readout, 'mass'>): string {
  const lb = r.mass === 'lb';
  const v = lb ? kg / KG_PER_LB : kg;
  return `${round(v, Math.abs(v) < 10 ? 2 : 1)} ${lb ? 'lb' : 'kg'}`;
}

/** A mass per length: "1.5 kg/m" or "1.01 lb/ft". */
export function massPerLengthText(kgPerM: number, r: Pick<Readout, 'mass'>): string {
  if (r.mass !== 'lb') return `${round(kgPerM, 2)} kg/m`;
  return `${round((kgPerM / KG_PER_LB) * 0.3048, 2)} lb/ft`;
}

/** Where masses read in pounds, densities read in lb/ft³; otherwise kg/m³. */
export const densityUnit = (r: Pick<Readout, 'mass'>): DensityUnit => (r.mass === 'lb' ? 'lb/ft3' : 'kg/m3');

/** "680 kg/m³" (nearest 1) or "42.5 lb/ft³" (nearest 0.1), the resolution a weighed sheet gives. */
export function densityText(kgPerM3: number, r: Pick<Readout, 'mass'>): string {
  if (r.mass !== 'lb') return `${round(kgPerM3, 0)} kg/m³`;
  return `${round(kgPerM3 / KG_M3_PER_LB_FT3, 1)} lb/ft³`;
}

const pad = (n: number): string => String(n).padStart(2, '0');

/** Year, month and day of a date-only text (read as written) or of a moment (in the runtime's time zone). */
function parts(when: string | Date): { y: number; m: number; d: number } | null {
  if (typeof when === 'string') {
    const only = /^(\d{4})-(\d{2})-(\d{2})$/.exec(when);
    if (only) return { y: Number(only[1]), m: Number(only[2]), d: Number(only[3]) };
  }
  const t = typeof when === 'string' ? new Date(when) : when;
  if (Number.isNaN(t.getTime())) return null;
  return { y: t.getFullYear(), m: t.getMonth() + 1, d: t.getDate() };
}

/** "2026-12-02" (ISO 8601, the default), "02/12/2026", "02.12.2026" or "12/02/2026". */
export function dateText(when: string | Date, r: Pick<Readout, 'date'>): string {
  const p = parts(when);
  if (!p) return '';
  const { y, m, d } = p;
  switch (r.date ?? 'iso') {
    case 'iso':
      return `${y}-${pad(m)}-${pad(d)}`;
    case 'dmy':
      return `${pad(d)}/${pad(m)}/${y}`;
    case 'dmy-dot':
      return `${pad(d)}.${pad(m)}.${y}`;
    case 'mdy':
      return `${pad(m)}/${pad(d)}/${y}`;
  }
}

/** The date and the 24-hour time of a moment: "2026-12-02 14:05". */
export function dateTimeText(when: string | Date, r: Pick<Readout, 'date'>): string {
  const t = typeof when === 'string' ? new Date(when) : when;
  if (Number.isNaN(t.getTime())) return '';
  return `${dateText(t, r)} ${pad(t.getHours())}:${pad(t.getMinutes())}`;
}

/** The formats offered in settings, each shown by how it writes 2 December 2026. */
export const DATE_FORMAT_CHOICES: readonly { value: DateFormat; title: string }[] = [
  { value: 'iso', title: '2026-12-02 (ISO 8601)' },
  { value: 'dmy', title: '02/12/2026 (day first)' },
  { value: 'dmy-dot', title: '02.12.2026 (day first)' },
  { value: 'mdy', title: '12/02/2026 (month first)' },
];
