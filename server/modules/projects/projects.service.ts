import { raw, type EntityManager } from '@mikro-orm/postgresql';
import type { ProjectDetail, ProjectSummary } from '@shared/api/projects';
import type { Role } from '@shared/api/roles';
import { Frame } from '../frames/frame.entity';
import { listFrameSummaries } from '../frames/frames.service';
import { User } from '../users/user.entity';
import { Workshop } from '../workshops/workshop.entity';
import { Project, type ProjectEntity } from './project.entity';

export async function liveFrameCounts(em: EntityManager, projectIds: string[]): Promise<Map<string, number>> {
  if (projectIds.length === 0) return new Map();
  const rows = await em
    .createQueryBuilder(Frame, 'f')
    .select(['f.project', raw('count(*)::int as count')])
    .where({ project: { $in: projectIds }, deletedAt: null })
    .groupBy('f.project')
    .execute<{ project_id: string; count: number }[]>('all', false);
  return new Map(rows.map((r) => [r.project_id, Number(r.count)]));
}

export function toSummary(p: ProjectEntity, frameCount: number): ProjectSummary {
  return {
    id: p.id,
    name: p.name,
    client: p.client,
    notes: p.notes,
    frameCount,
    updatedAt: p.updatedAt.toISOString(),
    createdAt: p.createdAt.toISOString(),
  };
}

export async function listProjects(em: EntityManager, workshopId: string): Promise<ProjectSummary[]> {
  const projects = await em.find(Project, { workshop: workshopId, deletedAt: null }, { orderBy: { updatedAt: 'desc', name: 'asc' } });
  const counts = await liveFrameCounts(em, projects.map((p) => p.id));
  return projects.map((p) => toSummary(p, counts.get(p.id) ?? 0));
}

export async function createProject(
  em: EntityManager,
  workshopId: string,
  input: { name: string; client?: string; notes?: string },
): Promise<ProjectSummary> {
  const project = em.create(Project, {
    workshop: em.getReference(Workshop, workshopId),
    name: input.name,
    client: input.client ?? '',
    notes: input.notes ?? '',
  });
  await em.flush();
  return toSummary(project, 0);
}

export async function projectDetail(em: EntityManager, project: ProjectEntity, role: Role): Promise<ProjectDetail> {
  return {
    id: project.id,
    workshopId: project.workshop.id,
    name: project.name,
    client: project.client,
    // The notes are the shop's own; a client sees the design, not what the shop wrote about the job.
    notes: role === 'client' ? '' : project.notes,
    role,
    updatedAt: project.updatedAt.toISOString(),
    createdAt: project.createdAt.toISOString(),
    frames: await listFrameSummaries(em, project.id, false),
  };
}

export async function updateProject(
  em: EntityManager,
  project: ProjectEntity,
  input: { name?: string; client?: string; notes?: string },
): Promise<ProjectSummary> {
  if (input.name !== undefined) project.name = input.name;
  if (input.client !== undefined) project.client = input.client;
  if (input.notes !== undefined) project.notes = input.notes;
  await em.flush();
  const counts = await liveFrameCounts(em, [project.id]);
  return toSummary(project, counts.get(project.id) ?? 0);
}

/** To the bin, with its frames: the rows stay, reachable from the bin only, until restored or purged. */
export async function deleteProject(em: EntityManager, project: ProjectEntity, userId: string): Promise<void> {
  project.deletedAt = new Date();
  project.deletedBy = em.getReference(User, userId);
  await em.flush();
}

export async function restoreProject(em: EntityManager, project: ProjectEntity): Promise<ProjectSummary> {
  project.deletedAt = null;
  project.deletedBy = null;
  await em.flush();
  const counts = await liveFrameCounts(em, [project.id]);
  return toSummary(project, counts.get(project.id) ?? 0);
}
