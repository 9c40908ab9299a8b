import { z } from 'zod';
import { LIMITS } from '../limits';
import { goodsSettingsSchema } from '../panels/goods-settings';
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

const list = <T extends z.ZodType>(item: T, max: number, what: string) => z.array(item).max(max, `at most ${max} ${what}`).default([]);

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
  profiles: list(profileOverrideSchema, LIMITS.profiles, 'profiles'),
  datums: list(datumSchema, LIMITS.datums, 'datums'),
  members: list(memberSchema, LIMITS.members, 'members'),
  modules: list(moduleSchema, LIMITS.modules, 'modules'),
  runs: list(runSchema, LIMITS.runs, 'runs'),
  joinMethods: list(joinMethodSchema, LIMITS.joinMethods, 'join methods'),
  joints: list(jointSettingSchema, LIMITS.joints, 'joint settings'),
  /** Drawers, panels and sheets as the builder chose them; absent on frames that keep the defaults. */
  goods: goodsSettingsSchema.optional(),
});
export type FrameDocument = z.output<typeof frameDocumentSchema>;
/** What a caller may write: defaults filled in on parsing. */
export type FrameDocumentInput = z.input<typeof frameDocumentSchema>;

export function emptyFrameDocument(name = ''): FrameDocument {
  return frameDocumentSchema.parse({ schemaVersion: CURRENT_SCHEMA_VERSION, name });
}
