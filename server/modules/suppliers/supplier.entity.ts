import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { SupplierStockLine } from '@shared/api/shop';
import { Workshop } from '../workshops/workshop.entity';

// Someone a workshop buys profile from: the bars they sell (per profile, or for any profile) with prices, and
// their terms for parts cut to length.
export const Supplier = defineEntity({
  name: 'Supplier',
  tableName: 'suppliers',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index('suppliers_workshop_idx'),
    name: p.string().columnType('text'),
    email: p.string().columnType('text'),
    currency: p.string().columnType('text').default('EUR'),
    stock: p.json<SupplierStockLine[]>().columnType('jsonb'),
    cutFee: p.double().default(0),
    notes: p.string().columnType('text').default(''),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
    deletedAt: p.datetime().nullable(),
  },
});
export type SupplierEntity = InferEntity<typeof Supplier>;
