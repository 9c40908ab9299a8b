import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { CutSessionPlan } from '@shared/api/shop';
import { Frame } from '../frames/frame.entity';
import { User } from '../users/user.entity';

// The plan the saw works from: frozen when cutting starts on a frame version, so every cutter ticks the same bars
// even if the design changes meanwhile (then the ticked parts feed the what-changed reuse plan).
export const CutSession = defineEntity({
  name: 'CutSession',
  tableName: 'cut_sessions',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    frame: p.manyToOne(Frame).deleteRule('cascade').index('cut_sessions_frame_idx'),
    frameVersion: p.integer(),
    plan: p.json<CutSessionPlan>().columnType('jsonb'),
    startedBy: p.manyToOne(User).nullable().deleteRule('set null'),
    startedAt: p.datetime().onCreate(() => new Date()),
  },
});
export type CutSessionEntity = InferEntity<typeof CutSession>;
