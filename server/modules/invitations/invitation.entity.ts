import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { ROLES } from '@shared/api/roles';
import { User } from '../users/user.entity';
import { Workshop } from '../workshops/workshop.entity';

// An e-mailed invitation: to the workshop with a role, or (role 'client') to the listed projects only. The
// token is single-use and kept as its SHA-256 only.
export const Invitation = defineEntity({
  name: 'Invitation',
  tableName: 'invitations',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index('invitations_workshop_idx'),
    email: p.string().columnType('text'),
    role: p.enum([...ROLES]),
    projectIds: p.json<string[]>().columnType('jsonb'),
    tokenHash: p.string().columnType('text').unique('invitations_token_hash_unique').hidden(),
    expiresAt: p.datetime(),
    acceptedAt: p.datetime().nullable(),
    acceptedBy: p.manyToOne(User).nullable().deleteRule('set null'),
    revokedAt: p.datetime().nullable(),
    invitedBy: p.manyToOne(User).nullable().deleteRule('set null'),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type InvitationEntity = InferEntity<typeof Invitation>;
