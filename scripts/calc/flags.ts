import { parseArgs } from 'node:util';

/**
 * The `--name value` options of a calc command, all strings, with the usage text on any unknown or malformed
 * option; `need` reads one that must be there.
 */
export function readFlags<const N extends string>(args: string[], names: readonly N[], usage: string) {
  const options = Object.fromEntries(names.map((n) => [n, { type: 'string' as const }])) as Record<N, { type: 'string' }>;
  let values: Partial<Record<N, string>>;
  try {
    values = parseArgs({ args, options, allowPositionals: false, strict: true }).values as Partial<Record<N, string>>;
  } catch (err) {
    throw new Error(`${err instanceof Error ? err.message : String(err)}\n${usage}`);
  }
  const need = (name: N): string => {
    const value = values[name];
    if (value === undefined || value.trim() === '') throw new Error(`--${name}: missing\n${usage}`);
    return value;
  };
  return { values, need };
}
