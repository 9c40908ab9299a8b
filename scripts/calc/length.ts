import { parseArgs } from 'node:util';
import { formatLength, mmToInches, parseLength, type InchFraction } from '@shared/geometry/units';

export type LengthOutput = { mm: number; inches: number; text_mm: string; text_in: string };

const USAGE =
  'usage: calc length "EXPR" [--frac 16|32] [--bare mm|in] [--decimal-comma]  e.g. calc length "29 1/2 in", calc length "3 ft - 40 mm", calc length "29 1/2" --bare in, calc length "1,5 m" --decimal-comma';

/** `calc length "EXPR"`: a length expression in millimetres and in shop inches. */
export async function run(args: string[]): Promise<LengthOutput> {
  const { values, positionals } = parseArgs({
    args,
    options: { frac: { type: 'string' }, bare: { type: 'string' }, 'decimal-comma': { type: 'boolean' } },
    allowPositionals: true,
    strict: true,
  });
  if (positionals.length !== 1) throw new Error(`length: give one length expression in quotes. ${USAGE}`);
  const frac = values.frac === undefined ? 16 : Number(values.frac);
  if (frac !== 16 && frac !== 32) throw new Error(`--frac: must be 16 or 32 (got "${values.frac}")`);
  const bare = values.bare ?? 'mm';
  if (bare !== 'mm' && bare !== 'in') throw new Error(`--bare: must be mm or in (got "${values.bare}")`);
  // The same reader as the editor, the forms and the CSV imports: a bare number is in --bare, "1,5" needs --decimal-comma.
  const mm = parseLength(positionals[0], 'length', { bare, decimalComma: values['decimal-comma'] ?? false });
  return {
    mm,
    // Trim float noise from the division (431.00625 mm reads 16.96875 in, not 16.968750000000004).
    inches: Math.round(mmToInches(mm) * 1e9) / 1e9,
    text_mm: formatLength(mm, 'mm'),
    text_in: formatLength(mm, 'in', frac as InchFraction),
  };
}
