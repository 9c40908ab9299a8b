import { recordActivity } from '../activity/activity.service';
import { LockMode, type EntityManager } from '@mikro-orm/postgresql';
import type { Invitation as InvitationDto, InvitationPreview, InviteRequest } from '@shared/api/invitations';
import type { Role } from '@shared/api/roles';
import { ROLE_LABELS } from '@shared/api/roles';
import type { Config } from '../../config';
import { ConflictError, ForbiddenError, HttpError, NotFoundError, ValidationError } from '../../errors';
import type { Mailer } from '../../mail/mailer';
import { ProjectClient } from '../access/project-client.entity';
import { hashToken, newToken } from '../access/tokens';
import { createUser } from '../auth/auth.service';
import { Project } from '../projects/project.entity';
import { User, type UserEntity } from '../users/user.entity';
import { Membership } from '../workshops/membership.entity';
import { Workshop } from '../workshops/workshop.entity';
import { Invitation, type InvitationEntity } from './invitation.entity';

const linkGone = () => new NotFoundError('Invitation', { token: 'This invitation has expired, was withdrawn or was already used' });

async function projectsOf(em: EntityManager, inv: InvitationEntity): Promise<{ id: string; name: string }[]> {
  if (inv.projectIds.length === 0) return [];
  const rows = await em.find(Project, { id: { $in: inv.projectIds }, workshop: inv.workshop.id, deletedAt: null }, { orderBy: { name: 'asc' } });
  return rows.map((p) => ({ id: p.id, name: p.name }));
}

async function toDto(em: EntityManager, inv: InvitationEntity): Promise<InvitationDto> {
  await em.populate(inv, ['invitedBy']);
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role,
    projects: await projectsOf(em, inv),
    expiresAt: inv.expiresAt.toISOString(),
    createdAt: inv.createdAt.toISOString(),
    invitedBy: inv.invitedBy ? { id: inv.invitedBy.id, name: inv.invitedBy.name } : null,
  };
}

function invitationMail(inv: { email: string; role: Role }, workshop: string, by: string, projects: string[], link: string, days: number) {
  const what =
    inv.role === 'client'
      ? `to look at ${projects.length === 1 ? 'the project' : 'the projects'} ${projects.map((p) => `"${p}"`).join(', ')} of ${workshop}`
      : `to join ${workshop} as ${ROLE_LABELS[inv.role]}`;
  return {
    kind: 'invitation' as const,
    to: inv.email,
    subject: inv.role === 'client' ? `${by} shared a project with you on Slotwright` : `${by} invited you to ${workshop} on Slotwright`,
    text: [
      `${by} invited you ${what}.`,
      '',
      `Accept within ${days} days with this link (it works once):`,
      link,
      '',
      'If you do not know the sender, ignore this mail.',
    ].join('\n'),
  };
}

export async function listInvitations(em: EntityManager, workshopId: string): Promise<InvitationDto[]> {
  const rows = await em.find(
    Invitation,
    { workshop: workshopId, acceptedAt: null, revokedAt: null, expiresAt: { $gt: new Date() } },
    { orderBy: { createdAt: 'desc' } },
  );
  return Promise.all(rows.map((r) => toDto(em, r)));
}

/** Records the invitation and mails its link; a failed mail leaves nothing behind. */
export async function invite(
  em: EntityManager,
  config: Config,
  mailer: Mailer,
  workshopId: string,
  inviterId: string,
  input: InviteRequest & { email: string },
): Promise<InvitationDto> {
  const workshop = await em.findOneOrFail(Workshop, { id: workshopId });
  const inviter = await em.findOneOrFail(User, { id: inviterId });
  const projectIds = input.role === 'client' ? [...new Set(input.projectIds)] : [];
  if (projectIds.length) {
    const found = await em.count(Project, { id: { $in: projectIds }, workshop: workshopId, deletedAt: null });
    if (found !== projectIds.length) throw new ValidationError({ projectIds: 'One of these projects is not in this workshop' });
  }
  const existing = await em.findOne(User, { email: input.email });
  if (existing && input.role !== 'client' && (await em.count(Membership, { workshop: workshopId, user: existing.id }))) {
    throw new ConflictError('Already a member of this workshop', { email: 'Already a member' });
  }
  if (existing && input.role === 'client' && (await em.count(Membership, { workshop: workshopId, user: existing.id }))) {
    throw new ConflictError('This person is a member of the workshop and sees its projects already', { email: 'Already a member' });
  }
  const { token, hash } = newToken();
  const inv = em.create(Invitation, {
    workshop,
    email: input.email,
    role: input.role,
    projectIds,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + config.invitationTtlMs),
    invitedBy: inviter,
  });
  await em.flush();
  const projects = (await projectsOf(em, inv)).map((p) => p.name);
  try {
    await mailer.send({
      ...invitationMail(inv, workshop.name, inviter.name, projects, `${config.appUrl}/invitation/${token}`, Math.round(config.invitationTtlMs / 86_400_000)),
      workshopId,
      replyTo: inviter.email,
    });
  } catch (err) {
    await em.nativeDelete(Invitation, { id: inv.id });
    throw new HttpError('unavailable', err instanceof Error ? err.message : 'The invitation could not be mailed');
  }
  for (const p of projectIds) await recordActivity(em, { projectId: p, userId: inviterId, kind: 'client.invited', subject: inv.email });
  return toDto(em, inv);
}

export async function revokeInvitation(em: EntityManager, inv: InvitationEntity): Promise<void> {
  inv.revokedAt = new Date();
  await em.flush();
}

async function openInvitation(em: EntityManager, token: string, lock = false): Promise<InvitationEntity> {
  const inv = await em.findOne(
    Invitation,
    { tokenHash: hashToken(token) },
    { populate: ['workshop', 'invitedBy'], ...(lock ? { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true } : {}) },
  );
  if (!inv || inv.acceptedAt || inv.revokedAt || inv.expiresAt.getTime() <= Date.now()) throw linkGone();
  return inv;
}

export async function previewInvitation(em: EntityManager, token: string): Promise<InvitationPreview> {
  const inv = await openInvitation(em, token);
  return {
    workshop: inv.workshop.name,
    email: inv.email,
    role: inv.role,
    projects: (await projectsOf(em, inv)).map((p) => p.name),
    invitedBy: inv.invitedBy?.name ?? null,
    hasAccount: (await em.count(User, { email: inv.email })) > 0,
  };
}

/**
 * Accepts an invitation: the signed-in account must be the invited address; with nobody signed in a new
 * account is made for that address (an existing one must sign in first). Runs under a lock on the invitation,
 * so it is used once.
 */
export async function acceptInvitation(
  em: EntityManager,
  config: Config,
  token: string,
  signedInUserId: string | undefined,
  body: { name?: string; password?: string },
): Promise<{ user: UserEntity; workshopId: string; role: Role; projectId: string | null }> {
  return em.transactional(async (tem) => {
    const inv = await openInvitation(tem, token, true);
    let user: UserEntity;
    if (signedInUserId) {
      user = await tem.findOneOrFail(User, { id: signedInUserId });
      if (user.email !== inv.email) {
        throw new ForbiddenError(`This invitation is for ${inv.email}; sign out and accept it with that account`);
      }
    } else {
      if (await tem.count(User, { email: inv.email })) {
        throw new HttpError('unauthenticated', `${inv.email} has an account already; sign in to accept`);
      }
      if (!body.name || !body.password) {
        throw new ValidationError({
          ...(body.name ? {} : { name: 'Required' }),
          ...(body.password ? {} : { password: 'Required' }),
        }, 'Choose your name and a password');
      }
      user = await createUser(tem, { email: inv.email, name: body.name, password: body.password }, config.bcryptCost);
    }
    const workshopId = inv.workshop.id;
    let projectId: string | null = null;
    if (inv.role === 'client') {
      const projects = await projectsOf(tem, inv);
      if (projects.length === 0) throw linkGone();
      const member = await tem.count(Membership, { workshop: workshopId, user: user.id });
      if (!member) {
        for (const p of projects) {
          if (!(await tem.count(ProjectClient, { project: p.id, user: user.id }))) {
            tem.create(ProjectClient, { project: tem.getReference(Project, p.id), user });
          }
        }
      }
      projectId = projects[0].id;
    } else {
      const m = await tem.findOne(Membership, { workshop: workshopId, user: user.id });
      if (!m) tem.create(Membership, { workshop: inv.workshop, user, role: inv.role });
      // A member sees every project; any client access they had here is now moot.
      const asClient = await tem.find(ProjectClient, { user: user.id, project: { workshop: workshopId } });
      for (const c of asClient) tem.remove(c);
    }
    inv.acceptedAt = new Date();
    inv.acceptedBy = user;
    await tem.flush();
    return { user, workshopId, role: inv.role, projectId };
  });
}
