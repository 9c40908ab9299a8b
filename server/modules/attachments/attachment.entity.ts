import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';

// A photo or PDF data sheet on a project, kept in PostgreSQL (bytea) so backups and access checks cover it.
// Lists load everything but `data`, which is lazy.
export const Attachment = defineEntity({
  name: 'Attachment',
  tableName: 'attachments',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    project: p.manyToOne(Project).deleteRule('cascade').index('attachments_project_idx'),
    filename: p.string().columnType('text'),
    contentType: p.string().columnType('text'),
    size: p.integer(),
    data: p.blob().lazy(),
    /** Shown to the project's clients and on its share links; off until an owner or designer turns it on. */
    sharedWithClient: p.boolean().default(false),
    uploadedBy: p.manyToOne(User).nullable().deleteRule('set null'),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type AttachmentEntity = InferEntity<typeof Attachment>;
