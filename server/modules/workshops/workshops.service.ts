import { LockMode, raw, type EntityManager } from '@mikro-orm/postgresql';
import type { Member, WorkshopSummary } from '@shared/api/workshops';
import type { Role, WorkshopRole } from '@shared/api/roles';
import { ConflictError, NotFoundError, UnprocessableError } from '../../errors';
import { toUserDto } from '../auth/auth.service';
import { User } from '../users/user.entity';
import { Membership, type MembershipEntity } from './membership.entity';
import { Workshop, type WorkshopEntity } from './workshop.entity';

async function memberCounts(em: EntityManager, workshopIds: string[]): Promise<Map<string, number>> {
  if (workshopIds.length === 0) return new Map();
  const rows = await em
    .createQueryBuilder(Membership, 'm')
    .select(['m.workshop', raw('count(*)::int as count')])
    .where({ workshop: { $in: workshopIds } })
    .groupBy('m.workshop')
    .execute<{ workshop_id: string; count: number }[]>('all', false);
  return new Map(rows.map((r) => [r.workshop_id, Number(r.count)]));
}

function toSummary(w: WorkshopEntity, role: Role, memberCount: number): WorkshopSummary {
  return { id: w.id, name: w.name, role, memberCount };
}

export async function listWorkshops(em: EntityManager, userId: string): Promise<WorkshopSummary[]> {
  const mine = await em.find(Membership, { user: userId }, { populate: ['workshop'], orderBy: { workshop: { name: 'asc' } } });
  const counts = await memberCounts(em, mine.map((m) => m.workshop.id));
  return mine.map((m) => toSummary(m.workshop, m.role, counts.get(m.workshop.id) ?? 0));
}

export async function createWorkshop(em: EntityManager, userId: string, name: string): Promise<WorkshopSummary> {
  const workshop = em.create(Workshop, { name });
  em.create(Membership, { workshop, user: em.getReference(User, userId), role: 'owner' });
  await em.flush();
  return toSummary(workshop, 'owner', 1);
}

export async function renameWorkshop(em: EntityManager, workshopId: string, role: Role, name: string): Promise<WorkshopSummary> {
  const workshop = await em.findOneOrFail(Workshop, { id: workshopId });
  workshop.name = name;
  await em.flush();
  const counts = await memberCounts(em, [workshopId]);
  return toSummary(workshop, role, counts.get(workshopId) ?? 0);
}

function toMember(m: MembershipEntity): Member {
  return { user: toUserDto(m.user), role: m.role };
}

export async function listMembers(em: EntityManager, workshopId: string): Promise<Member[]> {
  const rows = await em.find(Membership, { workshop: workshopId }, { populate: ['user'], orderBy: { user: { name: 'asc' } } });
  return rows.map(toMember);
}

export async function addMember(em: EntityManager, workshopId: string, email: string, role: WorkshopRole): Promise<Member> {
  const user = await em.findOne(User, { email });
  if (!user) throw new NotFoundError('User', { email: 'No account has this e-mail; ask them to sign up first' });
  if (await em.count(Membership, { workshop: workshopId, user: user.id })) {
    throw new ConflictError('Already a member of this workshop', { email: 'Already a member' });
  }
  const m = em.create(Membership, { workshop: em.getReference(Workshop, workshopId), user, role });
  await em.flush();
  return toMember(m);
}

/**
 * Role changes and removals run under a lock on the workshop row, so two owners demoting each other at the
 * same moment cannot leave the workshop with nobody to manage it.
 */
async function changeMembership(
  em: EntityManager,
  workshopId: string,
  userId: string,
  change: (m: MembershipEntity, em: EntityManager) => void,
  leavesOwner: (m: MembershipEntity) => boolean,
): Promise<MembershipEntity> {
  return em.transactional(async (tem) => {
    await tem.findOneOrFail(Workshop, { id: workshopId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
    const m = await tem.findOne(Membership, { workshop: workshopId, user: userId }, { populate: ['user'], refresh: true });
    if (!m) throw new NotFoundError('Member');
    if (m.role === 'owner' && !leavesOwner(m)) {
      const owners = await tem.count(Membership, { workshop: workshopId, role: 'owner' });
      if (owners <= 1) {
        throw new UnprocessableError('A workshop needs at least one owner; make someone else owner first', { role: 'Last owner' });
      }
    }
    change(m, tem);
    return m;
  });
}

export async function updateMemberRole(em: EntityManager, workshopId: string, userId: string, role: WorkshopRole): Promise<Member> {
  const m = await changeMembership(em, workshopId, userId, (x) => (x.role = role), () => role === 'owner');
  return toMember(m);
}

export async function removeMember(em: EntityManager, workshopId: string, userId: string): Promise<void> {
  await changeMembership(em, workshopId, userId, (x, tem) => tem.remove(x), () => false);
}
