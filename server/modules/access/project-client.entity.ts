import { randomUUID } from 'node:crypto';
import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';

// A client let into one project. Clients are never workshop members: what they may see is decided per project.
export const ProjectClient = defineEntity({
  name: 'ProjectClient',
  tableName: 'project_clients',
  properties: {
    id: p.uuid().primary().onCreate(() => randomUUID()),
    project: p.manyToOne(Project).deleteRule('cascade').index('project_clients_project_idx'),
    user: p.manyToOne(User).deleteRule('cascade').index('project_clients_user_idx'),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
  uniques: [{ name: 'project_clients_project_user_unique', properties: ['project', 'user'] }],
});
export type ProjectClientEntity = InferEntity<typeof ProjectClient>;
