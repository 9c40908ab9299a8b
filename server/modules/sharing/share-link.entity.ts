import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';

// A read-only link to a project for someone without an account. Only the SHA-256 of the token is kept, so the
// table alone opens nothing.
export const ShareLink = defineEntity({
  name: 'ShareLink',
  tableName: 'share_links',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    project: p.manyToOne(Project).deleteRule('cascade').index('share_links_project_idx'),
    tokenHash: p.string().columnType('text').unique('share_links_token_hash_unique').hidden(),
    expiresAt: p.datetime(),
    revokedAt: p.datetime().nullable(),
    createdBy: p.manyToOne(User).nullable().deleteRule('set null'),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type ShareLinkEntity = InferEntity<typeof ShareLink>;
