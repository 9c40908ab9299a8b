import { trySwapModules } from '@shared/editing/swap';
import type { FrameDocument } from '@shared/model/frame-document';
import { parseFrameDocument } from '@shared/model/parse';
import { readJson } from './read-json';

const USAGE = 'usage: calc swap FRAME.json MODULE_A MODULE_B';

/**
 * `calc swap FRAME.json MODULE_A MODULE_B`: the frame document with the two modules (by id) swapped and the frame
 * re-laid around them; when they cannot be swapped, the reason.
 */
export async function run(args: string[]): Promise<FrameDocument> {
  const unknown = args.find((a) => a.startsWith('--'));
  if (unknown) throw new Error(`${unknown}: unknown option. ${USAGE}`);
  if (args.length !== 3) throw new Error(`give a frame file and two module ids. ${USAGE}`);
  const [file, a, b] = args;
  const json = await readJson(file, 'FRAME.json', USAGE);
  let doc: FrameDocument;
  try {
    doc = parseFrameDocument(json);
  } catch (e) {
    throw new Error(`${file}: ${(e as Error).message}`);
  }
  for (const [id, field] of [
    [a, 'MODULE_A'],
    [b, 'MODULE_B'],
  ] as const) {
    if (!doc.modules.some((m) => m.id === id)) {
      throw new Error(`${field}: no module "${id}" in ${file} (its modules: ${doc.modules.map((m) => m.id).join(', ') || 'none'})`);
    }
  }
  const r = trySwapModules(doc, a, b);
  if (!r.ok) throw new Error(`cannot swap: ${r.reason}`);
  return r.doc;
}
