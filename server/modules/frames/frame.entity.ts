import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { FrameDocumentJson } from '@shared/api/frames';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';

// `version` is the document's version, compared with the client's baseVersion on save (optimistic locking
// done by the service under a row lock, not by the ORM, because renaming must not bump it).
// `memberCount` is derived from the document on every save, so lists can leave the document column out.
export const Frame = defineEntity({
  name: 'Frame',
  tableName: 'frames',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    project: p.manyToOne(Project).deleteRule('cascade').index('frames_project_idx'),
    name: p.string().columnType('text'),
    document: p.json<FrameDocumentJson>().columnType('jsonb'),
    version: p.integer().default(1),
    memberCount: p.integer().default(0),
    savedAt: p.datetime().onCreate(() => new Date()),
    savedBy: p.manyToOne(User).nullable().deleteRule('set null'),
    // The current document's place in the history: named, or closed (saved as a revision of its own), it is kept
    // when the next save replaces it; otherwise it is one step of an editing stretch and the next save folds it in.
    headName: p.string().columnType('text').nullable(),
    headKept: p.boolean().default(false),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
    /** Set when it goes to the bin (see shared/api/bin.ts); purged BIN_DAYS later unless restored. */
    deletedAt: p.datetime().nullable(),
    deletedBy: p.manyToOne(User).nullable().deleteRule('set null'),
  },
  indexes: [{ name: 'frames_bin_idx', expression: 'create index "frames_bin_idx" on "frames" ("deleted_at") where "deleted_at" is not null' }],
  checks: [{ name: 'frames_version_positive', expression: 'version >= 1' }],
});
export type FrameEntity = InferEntity<typeof Frame>;
