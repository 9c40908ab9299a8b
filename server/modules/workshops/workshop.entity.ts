import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';

export const Workshop = defineEntity({
  name: 'Workshop',
  tableName: 'workshops',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    name: p.string().columnType('text'),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type WorkshopEntity = InferEntity<typeof Workshop>;
