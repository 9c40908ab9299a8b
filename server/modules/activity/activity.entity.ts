import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { ACTIVITY_KINDS } from '@shared/api/activity';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';

// What happened on a project, and who did it. Repeated saves or ticks by one person within a short stretch
// are one row with a count, so the list reads as work done rather than as every keystroke.
export const Activity = defineEntity({
  name: 'Activity',
  tableName: 'project_activity',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    project: p.manyToOne(Project).deleteRule('cascade').index('project_activity_project_idx'),
    user: p.manyToOne(User).nullable().deleteRule('set null'),
    kind: p.enum([...ACTIVITY_KINDS]),
    /** The frame, order or address the entry is about, in words, as it was at the time. */
    subject: p.string().columnType('text'),
    /** What groups repeats (a frame's id for saves and ticks); '' for entries never grouped. */
    groupKey: p.string().columnType('text').default(''),
    count: p.integer().default(1),
    firstAt: p.datetime().onCreate(() => new Date()),
    lastAt: p.datetime().onCreate(() => new Date()),
  },
});
export type ActivityEntity = InferEntity<typeof Activity>;
