import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { FrameDocumentJson } from '@shared/api/frames';
import { User } from '../users/user.entity';
import { Frame } from './frame.entity';

// A document a frame had at the end of an editing stretch (or named, or restored from), kept when a later save
// replaced it. Versions in between were steps of the stretch and are folded into the next kept one.
export const FrameRevision = defineEntity({
  name: 'FrameRevision',
  tableName: 'frame_revisions',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    frame: p.manyToOne(Frame).deleteRule('cascade'),
    version: p.integer(),
    document: p.json<FrameDocumentJson>().columnType('jsonb'),
    memberCount: p.integer(),
    savedAt: p.datetime(),
    savedBy: p.manyToOne(User).nullable().deleteRule('set null'),
    name: p.string().columnType('text').nullable(),
  },
  uniques: [{ name: 'frame_revisions_frame_version_unique', properties: ['frame', 'version'] }],
});
export type FrameRevisionEntity = InferEntity<typeof FrameRevision>;
