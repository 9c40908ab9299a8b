import { z } from 'zod';
import { datumSchema } from './datum';
import { nameSchema } from './ids';
import { jointSettingSchema } from './joint';
import { joinMethodSchema } from './join-method';
import { memberSchema } from './member';
import { moduleSchema } from './module';
import { profileOverrideSchema } from './profile-override';
import { runSchema } from './run';
import { displayUnitsSchema, settingsSchema } from './settings';

/** The document version this build writes; older documents are upgraded on reading (see upgrades/). */
export const CURRENT_SCHEMA_VERSION = 1;

/**
 * A frame: flat lists of typed records with ids. All lengths in millimetres, masses in kilograms. Positions are
 * references (datums, bay edges, member faces), so swapping or resizing modules re-lays the frame without
 * touching member records.
 */
export const frameDocumentSchema = z.strictObject({
  schemaVersion: z.literal(CURRENT_SCHEMA_VERSION),
  id: z.string().max(64).optional(),
  name: nameSchema.default(''),
  units: displayUnitsSchema.prefault({}),
  settings: settingsSchema.prefault({}),
  profiles: z.array(profileOverrideSchema).default([]),
  datums: z.array(datumSchema).default([]),
  members: z.array(memberSchema).default([]),
  modules: z.array(moduleSchema).default([]),
  runs: z.array(runSchema).default([]),
  joinMethods: z.array(joinMethodSchema).default([]),
  joints: z.array(jointSettingSchema).default([]),
});
export type FrameDocument = z.output<typeof frameDocumentSchema>;
/** What a caller may write: defaults filled in on parsing. */
export type FrameDocumentInput = z.input<typeof frameDocumentSchema>;

export function emptyFrameDocument(name = ''): FrameDocument {
  return frameDocumentSchema.parse({ schemaVersion: CURRENT_SCHEMA_VERSION, name });
}
