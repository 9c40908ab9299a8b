import type { EntityManager } from '@mikro-orm/postgresql';
import { BIN_MS } from '@shared/api/bin';
import { can, type Action, type Role, type WorkshopRole } from '@shared/api/roles';
import { ForbiddenError, NotFoundError } from '../../errors';
import { Frame, type FrameEntity } from '../frames/frame.entity';
import { Project, type ProjectEntity } from '../projects/project.entity';
import { Membership } from '../workshops/membership.entity';
import { ProjectClient } from './project-client.entity';

// Every route that touches workshop data goes through one of these. Someone who is not a member gets 404
// (the workshop's contents are not theirs to know about); a member whose role lacks the action gets 403.
// A client is no member: the workshop's own pages (projects list, suppliers, orders, stock) are 404 to them,
// and in a project they were let into they hold the role 'client', which reads the design and nothing of the
// shop. A client refused an action gets 404 as well, so nothing tells them what else exists.

export async function roleIn(em: EntityManager, userId: string, workshopId: string): Promise<WorkshopRole | null> {
  const m = await em.findOne(Membership, { workshop: workshopId, user: userId }, { fields: ['role'] });
  return m?.role ?? null;
}

/** The caller's role in a project: their workshop role, else 'client' when let into this project, else null. */
export async function roleInProject(em: EntityManager, userId: string, project: ProjectEntity): Promise<Role | null> {
  const role = await roleIn(em, userId, project.workshop.id);
  if (role) return role;
  const asClient = await em.count(ProjectClient, { project: project.id, user: userId });
  return asClient > 0 ? 'client' : null;
}

function check(role: Role, action: Action, what: string): void {
  if (can(role, action)) return;
  if (role === 'client') throw new NotFoundError(what);
  throw new ForbiddenError();
}

/**
 * For a record found first and authorised after (an order, a supplier): someone outside its workshop gets the
 * very 404 a missing record gives, so the answer never tells whether the id exists.
 */
export function asNotFound<T>(what: string, check: Promise<T>): Promise<T> {
  return check.catch((err: unknown) => {
    throw err instanceof NotFoundError ? new NotFoundError(what) : err;
  });
}

export async function authorizeWorkshop(em: EntityManager, userId: string, workshopId: string, action: Action): Promise<WorkshopRole> {
  const role = await roleIn(em, userId, workshopId);
  if (!role) throw new NotFoundError('Workshop');
  check(role, action, 'Workshop');
  return role;
}

export async function authorizeProject(
  em: EntityManager,
  userId: string,
  projectId: string,
  action: Action,
): Promise<{ project: ProjectEntity; role: Role }> {
  const project = await em.findOne(Project, { id: projectId, deletedAt: null });
  const role = project ? await roleInProject(em, userId, project) : null;
  if (!project || !role) throw new NotFoundError('Project');
  check(role, action, 'Project');
  return { project, role };
}

/** Deleted frames, and the frames of a deleted project, are in the bin: no route but the bin's reaches them. */
export async function authorizeFrame(
  em: EntityManager,
  userId: string,
  frameId: string,
  action: Action,
): Promise<{ frame: FrameEntity; role: Role }> {
  const frame = await em.findOne(Frame, { id: frameId, deletedAt: null, project: { deletedAt: null } }, { populate: ['project'] });
  const role = frame ? await roleInProject(em, userId, frame.project) : null;
  if (!frame || !role) throw new NotFoundError('Frame');
  check(role, action, 'Frame');
  return { frame, role };
}

/** The oldest deletion still in the bin; anything deleted before it is as good as purged. */
export function binCutoff(now = Date.now()): Date {
  return new Date(now - BIN_MS);
}

/**
 * A project in the bin, for a member who may restore it. A client is no member, so the bin is 404 to them, as is
 * anything past its 30 days.
 */
export async function authorizeBinnedProject(em: EntityManager, userId: string, projectId: string): Promise<ProjectEntity> {
  const project = await em.findOne(Project, { id: projectId, deletedAt: { $gt: binCutoff() } });
  const role = project ? await roleIn(em, userId, project.workshop.id) : null;
  if (!project || !role) throw new NotFoundError('Project');
  check(role, 'project.write', 'Project');
  return project;
}

/** A frame in the bin (its project live), for a member who may restore it; 404 to clients and outsiders. */
export async function authorizeBinnedFrame(em: EntityManager, userId: string, frameId: string): Promise<FrameEntity> {
  const frame = await em.findOne(Frame, { id: frameId, deletedAt: { $gt: binCutoff() }, project: { deletedAt: null } }, { populate: ['project'] });
  const role = frame ? await roleIn(em, userId, frame.project.workshop.id) : null;
  if (!frame || !role) throw new NotFoundError('Frame');
  check(role, 'frame.write', 'Frame');
  return frame;
}
