import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workshop } from '../workshops/workshop.entity';

// A workshop's own profile with its supplier's section figures (imported from CSV).
export const CustomProfile = defineEntity({
  name: 'CustomProfile',
  tableName: 'custom_profiles',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    workshop: p.manyToOne(Workshop).deleteRule('cascade'),
    name: p.string().columnType('text'),
    widthMm: p.double(),
    heightMm: p.double(),
    areaMm2: p.double(),
    ixMm4: p.double(),
    iyMm4: p.double(),
    wxMm3: p.double().nullable(),
    wyMm3: p.double().nullable(),
    massKgPerM: p.double(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
  uniques: [{ name: 'custom_profiles_workshop_name_unique', properties: ['workshop', 'name'] }],
});
export type CustomProfileEntity = InferEntity<typeof CustomProfile>;
