import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { ORDER_STATUSES, type OrderContents } from '@shared/api/shop';
import { Frame } from '../frames/frame.entity';
import { User } from '../users/user.entity';
import { Workshop } from '../workshops/workshop.entity';
import { Supplier } from '../suppliers/supplier.entity';

// An order to a supplier for one frame's profile, with what was ordered frozen at the time it was made. Status
// moves draft → sending → sent → received in single conditional updates, so two clicks on "Send" mail once.
export const Order = defineEntity({
  name: 'Order',
  tableName: 'orders',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index('orders_workshop_idx'),
    frame: p.manyToOne(Frame).nullable().deleteRule('set null'),
    supplier: p.manyToOne(Supplier).nullable().deleteRule('set null'),
    reference: p.string().columnType('text'),
    status: p.enum([...ORDER_STATUSES]).default('draft'),
    mode: p.enum(['stock', 'cut-to-length']).default('stock'),
    frameVersion: p.integer().nullable(),
    contents: p.json<OrderContents>().columnType('jsonb'),
    createdBy: p.manyToOne(User).nullable().deleteRule('set null'),
    createdAt: p.datetime().onCreate(() => new Date()),
    sentAt: p.datetime().nullable(),
    sentBy: p.manyToOne(User).nullable().deleteRule('set null'),
    sentTo: p.string().columnType('text').nullable(),
    messageId: p.string().columnType('text').nullable(),
    sendError: p.string().columnType('text').nullable(),
    receivedAt: p.datetime().nullable(),
  },
  uniques: [{ name: 'orders_workshop_reference_unique', properties: ['workshop', 'reference'] }],
});
export type OrderEntity = InferEntity<typeof Order>;
