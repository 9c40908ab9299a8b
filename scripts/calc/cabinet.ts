import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import type { FrameDocument } from '@shared/model/frame-document';
import { readJson } from './read-json';

const USAGE = 'usage: calc cabinet SPEC.json';

/**
 * `calc cabinet SPEC.json`: the frame document for a cabinet layout (see shared/model/cabinet-run.ts): uprights,
 * rails, cross-members and the members that carry each module, all by reference, so `calc swap` can re-lay it.
 */
export async function run(args: string[]): Promise<FrameDocument> {
  const unknown = args.find((a) => a.startsWith('--'));
  if (unknown) throw new Error(`${unknown}: unknown option. ${USAGE}`);
  if (args.length !== 1) throw new Error(`SPEC.json: give exactly one cabinet layout file. ${USAGE}`);
  const json = await readJson(args[0], 'SPEC.json', USAGE);
  try {
    return buildCabinetRun(parseCabinetSpec(json));
  } catch (e) {
    throw new Error(`${args[0]}: ${(e as Error).message}`);
  }
}
