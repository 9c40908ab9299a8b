import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { User } from '../users/user.entity';
import { CutSession } from './cut-session.entity';

// One cut done at the saw. The unique key makes a tick idempotent: two cutters tapping the same cut make one row.
export const CutTick = defineEntity({
  name: 'CutTick',
  tableName: 'cut_ticks',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    session: p.manyToOne(CutSession).deleteRule('cascade'),
    cutKey: p.string().columnType('text'),
    mark: p.string().columnType('text'),
    tickedBy: p.manyToOne(User).nullable().deleteRule('set null'),
    tickedAt: p.datetime().onCreate(() => new Date()),
  },
  uniques: [{ name: 'cut_ticks_session_key_unique', properties: ['session', 'cutKey'] }],
});
export type CutTickEntity = InferEntity<typeof CutTick>;
