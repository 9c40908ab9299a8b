import { defineEntity, p, type InferEntity } from '@mikro-orm/core';

// Failed sign-ins, sign-ups and reset requests counted per key in PostgreSQL, so every server on the database
// sees the same counts and a restart forgets nothing. Keys: `pair:<address>|<e-mail>`, `ip:<address>`,
// `signup:<address>`, `reset:<address>|<e-mail>`, `reset-ip:<address>`.
export const SignInThrottle = defineEntity({
  name: 'SignInThrottle',
  tableName: 'sign_in_throttles',
  properties: {
    key: p.string().columnType('text').primary(),
    failures: p.integer(),
    windowStartedAt: p.datetime(),
    blockedUntil: p.datetime().nullable(),
  },
});
export type SignInThrottleEntity = InferEntity<typeof SignInThrottle>;
