import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';

// E-mail is stored lower-cased (the API lower-cases it at the edge) and unique, which makes it unique
// regardless of case; the check constraint keeps any other writer honest.
export const User = defineEntity({
  name: 'User',
  tableName: 'users',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    email: p.string().columnType('text').unique('users_email_unique'),
    name: p.string().columnType('text'),
    passwordHash: p.string().columnType('text').hidden(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
  checks: [{ name: 'users_email_lowercase', expression: 'email = lower(email)' }],
});
export type UserEntity = InferEntity<typeof User>;
