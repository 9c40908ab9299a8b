import { InputError } from '../errors';
import type { LengthOptions } from '../geometry/units';
import { lengthCell, positiveNumber, readCsv, requiredText, type CsvImport } from './csv-import';

export type OffcutRow = { profileId: string; length_mm: number; qty: number };

export const OFFCUT_COLUMNS = [
  { key: 'profile', names: ['profile'], required: true },
  { key: 'length', names: ['length', 'length mm', 'length_mm'], required: true },
  { key: 'quantity', names: ['quantity', 'qty', 'count'], required: false },
] as const;

/**
 * Offcuts on the shelf: profile, length (a bare number in the workshop's unit), quantity (1 when blank). `resolveProfile` maps what the builder typed
 * (a catalogue id, a profile name, or a custom profile of the workshop) to a profile id, or null if unknown.
 */
export function parseOffcutsCsv(text: string, resolveProfile: (typed: string) => string | null, opts: LengthOptions = {}): CsvImport<OffcutRow> {
  // A header that names millimetres ("Length (mm)", our own export) means them, whatever the unit on screen.
  const header = text.replace(/^\uFEFF/, '').split(/\r?\n/, 1)[0] ?? '';
  const lengthOpts: LengthOptions = /length\s*[(_]?\s*mm\b/i.test(header) ? { ...opts, bare: 'mm' } : opts;
  return readCsv(text, OFFCUT_COLUMNS, (rec) => {
    const typed = requiredText(rec, 'profile', 64);
    const profileId = resolveProfile(typed);
    if (!profileId) throw new InputError('profile', `profile: "${typed}" is not a profile of this workshop`);
    const length_mm = lengthCell(rec, 'length', lengthOpts);
    if (length_mm > 20000) throw new InputError('length', 'length: longer than 20 m; check the unit');
    const qty = rec.quantity === '' ? 1 : (positiveNumber(rec, 'quantity', { integer: true }) as number);
    if (qty > 1000) throw new InputError('quantity', 'quantity: more than 1000');
    return { profileId, length_mm, qty };
  });
}
