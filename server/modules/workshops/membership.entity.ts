import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { WORKSHOP_ROLES } from '@shared/api/roles';
import { User } from '../users/user.entity';
import { Workshop } from './workshop.entity';

export const Membership = defineEntity({
  name: 'Membership',
  tableName: 'memberships',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index('memberships_workshop_idx'),
    user: p.manyToOne(User).deleteRule('cascade').index('memberships_user_idx'),
    role: p.enum([...WORKSHOP_ROLES]),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
  uniques: [{ name: 'memberships_workshop_user_unique', properties: ['workshop', 'user'] }],
});
export type MembershipEntity = InferEntity<typeof Membership>;
