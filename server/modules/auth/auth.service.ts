import bcrypt from 'bcryptjs';
import { UniqueConstraintViolationException, type EntityManager } from '@mikro-orm/postgresql';
import type { ClientProject, Membership as MembershipDto, User as UserDto } from '@shared/api/auth';
import { ProjectClient } from '../access/project-client.entity';
import { ConflictError } from '../../errors';
import { User, type UserEntity } from '../users/user.entity';
import { Membership } from '../workshops/membership.entity';

// Compared against when the e-mail is unknown, so a wrong e-mail takes as long as a wrong password: made at the
// cost real passwords are hashed with (bcrypt's work doubles with each step of cost), once per cost.
const unknownUserHashes = new Map<number, Promise<string>>();
function unknownUserHash(cost: number): Promise<string> {
  let h = unknownUserHashes.get(cost);
  if (!h) unknownUserHashes.set(cost, (h = bcrypt.hash('no account has this password', cost)));
  return h;
}

export function toUserDto(u: Pick<UserEntity, 'id' | 'email' | 'name'>): UserDto {
  return { id: u.id, email: u.email, name: u.name };
}

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

/** `email` must already be normalised (trimmed, lower-cased) by the request schema. */
export async function createUser(
  em: EntityManager,
  input: { email: string; password: string; name: string },
  bcryptCost: number,
): Promise<UserEntity> {
  const taken = () => new ConflictError('An account with this e-mail already exists', { email: 'Already registered' });
  if (await em.count(User, { email: input.email })) throw taken();
  const user = em.create(User, { email: input.email, name: input.name, passwordHash: await hashPassword(input.password, bcryptCost) });
  try {
    await em.flush();
  } catch (err) {
    if (err instanceof UniqueConstraintViolationException) throw taken();
    throw err;
  }
  return user;
}

/** The user when the password matches, otherwise null (never says which part was wrong). */
export async function verifyCredentials(em: EntityManager, email: string, password: string, bcryptCost: number): Promise<UserEntity | null> {
  const user = await em.findOne(User, { email });
  const ok = await bcrypt.compare(password, user?.passwordHash ?? (await unknownUserHash(bcryptCost)));
  return user && ok ? user : null;
}

export async function findUser(em: EntityManager, id: string): Promise<UserEntity | null> {
  return em.findOne(User, { id });
}

export async function membershipsOf(em: EntityManager, userId: string): Promise<MembershipDto[]> {
  const rows = await em.find(Membership, { user: userId }, { populate: ['workshop'], orderBy: { workshop: { name: 'asc' } } });
  return rows.map((m) => ({ workshop: { id: m.workshop.id, name: m.workshop.name }, role: m.role }));
}

/** Projects the user was let into as a client (live ones only). */
export async function clientProjectsOf(em: EntityManager, userId: string): Promise<ClientProject[]> {
  const rows = await em.find(
    ProjectClient,
    { user: userId, project: { deletedAt: null } },
    { populate: ['project', 'project.workshop'], orderBy: { project: { name: 'asc' } } },
  );
  return rows.map((r) => ({ project: { id: r.project.id, name: r.project.name }, workshop: { id: r.project.workshop.id, name: r.project.workshop.name } }));
}
