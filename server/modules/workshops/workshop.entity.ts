import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';

export const Workshop = defineEntity({
  name: 'Workshop',
  tableName: 'workshops',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    name: p.string().columnType('text'),
    /** Stored as given after validation; read through readWorkshopSettings so older rows get the newer defaults. */
    settings: p.json<Record<string, unknown>>().columnType('jsonb').default('{}'),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type WorkshopEntity = InferEntity<typeof Workshop>;
