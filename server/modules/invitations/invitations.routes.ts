import { Router } from 'express';
import type { AcceptInvitationResponse, Invitation, InvitationPreview, ProjectClient as ProjectClientDto } from '@shared/api/invitations';
import {
  acceptInvitationRequestSchema,
  invitationParamsSchema,
  inviteRequestSchema,
  projectClientParamsSchema,
  tokenParamsSchema,
} from '@shared/api/invitations';
import { projectParamsSchema } from '@shared/api/projects';
import { workshopParamsSchema } from '@shared/api/workshops';
import type { Config } from '../../config';
import type { Orm } from '../../db';
import { NotFoundError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { createMailer } from '../../mail/mailer';
import { parseInput } from '../../validate';
import { authorizeProject, authorizeWorkshop } from '../access/access.service';
import { ProjectClient } from '../access/project-client.entity';
import { startSignedInSession } from '../auth/auth.routes';
import { toUserDto } from '../auth/auth.service';
import { Invitation as InvitationRow } from './invitation.entity';
import { recordActivity } from '../activity/activity.service';
import { acceptInvitation, invite, listInvitations, previewInvitation, revokeInvitation } from './invitations.service';

export function invitationsRouter(orm: Orm, config: Config): Router {
  const router = Router();

  router.get('/workshops/:workshopId/invitations', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'members.manage');
    res.json((await listInvitations(orm.em, workshopId)) satisfies Invitation[]);
  });

  router.post('/workshops/:workshopId/invitations', async (req, res) => {
    const userId = currentUserId(req);
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, userId, workshopId, 'members.manage');
    const input = parseInput(inviteRequestSchema, req.body);
    const mailer = createMailer(config.mail);
    try {
      res.status(201).json((await invite(orm.em, config, mailer, workshopId, userId, input)) satisfies Invitation);
    } finally {
      mailer.close();
    }
  });

  router.delete('/invitations/:invitationId', async (req, res) => {
    const { invitationId } = parseInput(invitationParamsSchema, req.params, 'params');
    const inv = await orm.em.findOne(InvitationRow, { id: invitationId });
    if (!inv) throw new NotFoundError('Invitation');
    await authorizeWorkshop(orm.em, currentUserId(req), inv.workshop.id, 'members.manage');
    await revokeInvitation(orm.em, inv);
    res.status(204).end();
  });

  // Open to anyone with the link: it was mailed to the invited address.
  router.get('/invitations/:token', async (req, res) => {
    const { token } = parseInput(tokenParamsSchema, req.params, 'params');
    res.json((await previewInvitation(orm.em, token)) satisfies InvitationPreview);
  });

  router.post('/invitations/:token/accept', async (req, res) => {
    const { token } = parseInput(tokenParamsSchema, req.params, 'params');
    const body = parseInput(acceptInvitationRequestSchema, req.body ?? {});
    const result = await acceptInvitation(orm.em, config, token, req.session.userId, body);
    const csrfToken = await startSignedInSession(req, result.user.id);
    res.json({ user: toUserDto(result.user), csrfToken, workshopId: result.workshopId, role: result.role, projectId: result.projectId } satisfies AcceptInvitationResponse);
  });

  // The clients let into a project, for the workshop's owners.
  router.get('/projects/:projectId/clients', async (req, res) => {
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    await authorizeProject(orm.em, currentUserId(req), projectId, 'members.manage');
    const rows = await orm.em.find(ProjectClient, { project: projectId }, { populate: ['user'], orderBy: { user: { name: 'asc' } } });
    res.json(rows.map((r) => ({ user: toUserDto(r.user), since: r.createdAt.toISOString() })) satisfies ProjectClientDto[]);
  });

  router.delete('/projects/:projectId/clients/:userId', async (req, res) => {
    const { projectId, userId } = parseInput(projectClientParamsSchema, req.params, 'params');
    await authorizeProject(orm.em, currentUserId(req), projectId, 'members.manage');
    const client = await orm.em.findOne(ProjectClient, { project: projectId, user: userId }, { populate: ['user'] });
    if (!client) throw new NotFoundError('Client');
    await orm.em.nativeDelete(ProjectClient, { id: client.id });
    await recordActivity(orm.em, { projectId, userId: currentUserId(req), kind: 'client.removed', subject: client.user.email });
    res.status(204).end();
  });

  return router;
}
