import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { FrameDocumentJson } from '@shared/api/frames';
import { User } from '../users/user.entity';
import { Frame } from './frame.entity';

// A document a frame had before a save replaced it: one row per superseded version.
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
  },
  uniques: [{ name: 'frame_revisions_frame_version_unique', properties: ['frame', 'version'] }],
});
export type FrameRevisionEntity = InferEntity<typeof FrameRevision>;
