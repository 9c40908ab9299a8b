import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
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
    deletedAt: p.datetime().nullable(),
  },
});
export type ProjectEntity = InferEntity<typeof Project>;
