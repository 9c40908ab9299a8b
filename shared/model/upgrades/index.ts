import { InputError } from '../../errors';
import { CURRENT_SCHEMA_VERSION } from '../frame-document';
import { upgradeV0toV1 } from './v0-to-v1';

type Upgrade = (doc: Record<string, unknown>) => Record<string, unknown>;

/** `UPGRADES[n]` turns a version-n document into version n + 1. One entry per step, each tested on its own. */
export const UPGRADES: Readonly<Record<number, Upgrade>> = {
  0: upgradeV0toV1,
};

/** The document's version: a missing `schemaVersion` means the pre-release version 0. */
export function versionOf(doc: Record<string, unknown>): number {
  const v = doc.schemaVersion;
  if (v === undefined) return 0;
  if (typeof v !== 'number' || !Number.isInteger(v) || v < 0) {
    throw new InputError('schemaVersion', 'schemaVersion: must be a whole number');
  }
  return v;
}

/** Bring a stored document up to the current version, step by step. The input is not modified. */
export function upgradeDocument(json: unknown): Record<string, unknown> {
  if (!json || typeof json !== 'object' || Array.isArray(json)) {
    throw new InputError('document', 'document: must be a JSON object');
  }
  let doc = json as Record<string, unknown>;
  let v = versionOf(doc);
  if (v > CURRENT_SCHEMA_VERSION) {
    throw new InputError(
      'schemaVersion',
      `schemaVersion: the document is version ${v}, newer than this build reads (${CURRENT_SCHEMA_VERSION}); update the program`,
    );
  }
  while (v < CURRENT_SCHEMA_VERSION) {
    const step = UPGRADES[v];
    if (!step) throw new InputError('schemaVersion', `schemaVersion: no upgrade from version ${v}`);
    doc = step(doc);
    v += 1;
  }
  return doc;
}
