import { listProfiles } from '@shared/catalog/profiles';

/** `calc profiles`: the catalogue ids, metric first, then inch. */
export async function run(args: string[]): Promise<string[]> {
  if (args.length > 0) throw new Error(`profiles: takes no arguments (got "${args.join(' ')}")`);
  return listProfiles().map((p) => p.id);
}
