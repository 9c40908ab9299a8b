import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { User } from '../users/user.entity';

// A password-reset token: single use, short-lived, kept as its SHA-256 only.
export const PasswordReset = defineEntity({
  name: 'PasswordReset',
  tableName: 'password_resets',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    user: p.manyToOne(User).deleteRule('cascade').index('password_resets_user_idx'),
    tokenHash: p.string().columnType('text').unique('password_resets_token_hash_unique').hidden(),
    expiresAt: p.datetime(),
    usedAt: p.datetime().nullable(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type PasswordResetEntity = InferEntity<typeof PasswordReset>;
