import { readFile } from 'node:fs/promises';

/** A JSON file named on the command line; errors name the argument (`SPEC.json`) and say what is wrong. */
export async function readJson(path: string | undefined, field: string, usage: string): Promise<unknown> {
  if (!path || path.startsWith('--')) throw new Error(`${field}: give the file. ${usage}`);
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    throw new Error(`${field}: cannot read "${path}" (${(e as NodeJS.ErrnoException).code ?? 'error'})`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new Error(`${field}: "${path}" is not valid JSON (${(e as Error).message})`);
  }
}
