import type { EntityManager } from '@mikro-orm/postgresql';
import { can, type Action, type Role } from '@shared/api/roles';
import { ForbiddenError, NotFoundError } from '../../errors';
import { Frame, type FrameEntity } from '../frames/frame.entity';
import { Project, type ProjectEntity } from '../projects/project.entity';
import { Membership } from '../workshops/membership.entity';

// Every route that touches workshop data goes through one of these. Someone who is not a member gets 404
// (the workshop's contents are not theirs to know about); a member whose role lacks the action gets 403.

export async function roleIn(em: EntityManager, userId: string, workshopId: string): Promise<Role | null> {
  const m = await em.findOne(Membership, { workshop: workshopId, user: userId }, { fields: ['role'] });
  return m?.role ?? null;
}

function check(role: Role, action: Action): void {
  if (!can(role, action)) throw new ForbiddenError();
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

export async function authorizeWorkshop(em: EntityManager, userId: string, workshopId: string, action: Action): Promise<Role> {
  const role = await roleIn(em, userId, workshopId);
  if (!role) throw new NotFoundError('Workshop');
  check(role, action);
  return role;
}

export async function authorizeProject(
  em: EntityManager,
  userId: string,
  projectId: string,
  action: Action,
): Promise<{ project: ProjectEntity; role: Role }> {
  const project = await em.findOne(Project, { id: projectId, deletedAt: null });
  const role = project ? await roleIn(em, userId, project.workshop.id) : null;
  if (!project || !role) throw new NotFoundError('Project');
  check(role, action);
  return { project, role };
}

/** Frames of a deleted project are gone with it; a deleted frame itself is still reachable (to read or restore). */
export async function authorizeFrame(
  em: EntityManager,
  userId: string,
  frameId: string,
  action: Action,
): Promise<{ frame: FrameEntity; role: Role }> {
  const frame = await em.findOne(Frame, { id: frameId, project: { deletedAt: null } }, { populate: ['project'] });
  const role = frame ? await roleIn(em, userId, frame.project.workshop.id) : null;
  if (!frame || !role) throw new NotFoundError('Frame');
  check(role, action);
  return { frame, role };
}
