import { InputError } from '../errors';
import { parseLength } from '../geometry/units';
import { positiveNumber, readCsv, requiredText, type CsvImport } from './csv-import';

/** A builder's own profile with their supplier's figures; the engine treats it as a rectangle of that size overridden by these. */
export type CustomProfileRow = {
  name: string;
  width_mm: number;
  height_mm: number;
  area_mm2: number;
  Ix_mm4: number;
  Iy_mm4: number;
  Wx_mm3?: number;
  Wy_mm3?: number;
  mass_kg_per_m: number;
};

export const PROFILE_COLUMNS = [
  { key: 'name', names: ['name', 'profile'], required: true },
  { key: 'size', names: ['size', 'size mm'], required: true },
  { key: 'area_mm2', names: ['area_mm2', 'area', 'area mm2'], required: true },
  { key: 'Ix_mm4', names: ['Ix_mm4', 'Ix', 'Ix mm4'], required: true },
  { key: 'Iy_mm4', names: ['Iy_mm4', 'Iy', 'Iy mm4'], required: true },
  { key: 'Wx_mm3', names: ['Wx_mm3', 'Wx', 'Wx mm3'], required: false },
  { key: 'Wy_mm3', names: ['Wy_mm3', 'Wy', 'Wy mm3'], required: false },
  { key: 'mass_kg_per_m', names: ['mass_kg_per_m', 'mass', 'mass kg/m', 'kg/m'], required: true },
] as const;

/** "40x40", "40 × 80 mm", "1.5x1.5 in": width × height; a unit after the second figure applies to both (mm when none). */
export function parseSize(text: string): { width_mm: number; height_mm: number } {
  const m = /^\s*([\d.]+)\s*[x×*X]\s*([\d.]+)\s*([a-z"]*)\s*$/.exec(text);
  if (!m) throw new InputError('size', `size: "${text}" is not width × height, e.g. "40x40" or "1.5x3 in"`);
  const unit = m[3] || 'mm';
  const w = parseLength(`${m[1]} ${unit}`, 'size');
  const h = parseLength(`${m[2]} ${unit}`, 'size');
  if (!(w > 0 && h > 0) || w > 500 || h > 500) throw new InputError('size', `size: "${text}" must be between 0 and 500 mm each way`);
  return { width_mm: Math.round(w * 1000) / 1000, height_mm: Math.round(h * 1000) / 1000 };
}

export function parseProfilesCsv(text: string): CsvImport<CustomProfileRow> {
  const seen = new Set<string>();
  return readCsv(text, PROFILE_COLUMNS, (rec) => {
    const name = requiredText(rec, 'name', 120);
    const key = name.toLowerCase();
    if (seen.has(key)) throw new InputError('name', `name: "${name}" appears twice in the file`);
    const size = parseSize(requiredText(rec, 'size'));
    const row: CustomProfileRow = {
      name,
      ...size,
      area_mm2: positiveNumber(rec, 'area_mm2') as number,
      Ix_mm4: positiveNumber(rec, 'Ix_mm4') as number,
      Iy_mm4: positiveNumber(rec, 'Iy_mm4') as number,
      Wx_mm3: positiveNumber(rec, 'Wx_mm3', { optional: true }),
      Wy_mm3: positiveNumber(rec, 'Wy_mm3', { optional: true }),
      mass_kg_per_m: positiveNumber(rec, 'mass_kg_per_m') as number,
    };
    if (row.area_mm2 > size.width_mm * size.height_mm) throw new InputError('area_mm2', `area_mm2: ${row.area_mm2} is more than the ${size.width_mm} × ${size.height_mm} box around the section`);
    if (row.mass_kg_per_m > 100) throw new InputError('mass_kg_per_m', 'mass_kg_per_m: more than 100 kg/m; check the unit');
    seen.add(key);
    return row;
  });
}
