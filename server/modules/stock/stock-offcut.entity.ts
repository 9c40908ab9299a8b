import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workshop } from '../workshops/workshop.entity';

// Offcuts on the workshop's shelf: the planner uses them before buying bars.
export const StockOffcut = defineEntity({
  name: 'StockOffcut',
  tableName: 'stock_offcuts',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index('stock_offcuts_workshop_idx'),
    profile: p.string().columnType('text'),
    lengthMm: p.double(),
    qty: p.integer(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
  checks: [
    { name: 'stock_offcuts_qty_positive', expression: 'qty > 0' },
    { name: 'stock_offcuts_length_positive', expression: 'length_mm > 0' },
  ],
});
export type StockOffcutEntity = InferEntity<typeof StockOffcut>;
