import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { User } from '../users/user.entity';
import { Workshop } from '../workshops/workshop.entity';

export const Project = defineEntity({
  name: 'Project',
  tableName: 'projects',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index('projects_workshop_idx'),
    name: p.string().columnType('text'),
    client: p.string().columnType('text').default(''),
    notes: p.string().columnType('text').default(''),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
    /** Set when it goes to the bin (see shared/api/bin.ts); purged BIN_DAYS later unless restored. */
    deletedAt: p.datetime().nullable(),
    deletedBy: p.manyToOne(User).nullable().deleteRule('set null'),
  },
  indexes: [{ name: 'projects_bin_idx', expression: 'create index "projects_bin_idx" on "projects" ("deleted_at") where "deleted_at" is not null' }],
});
export type ProjectEntity = InferEntity<typeof Project>;
