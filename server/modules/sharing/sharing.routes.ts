import { Router } from 'express';
import { z } from 'zod';
import { idSchema } from '@shared/api/common';
import { tokenSchema } from '@shared/api/invitations';
import { projectParamsSchema } from '@shared/api/projects';
import type { CreatedShareLink, ShareLink as ShareLinkDto, SharedProject } from '@shared/api/sharing';
import { createShareLinkRequestSchema, shareLinkParamsSchema } from '@shared/api/sharing';
import type { Config } from '../../config';
import type { Orm } from '../../db';
import { NotFoundError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { authorizeProject } from '../access/access.service';
import { hashToken, newToken } from '../access/tokens';
import { Attachment } from '../attachments/attachment.entity';
import { Frame } from '../frames/frame.entity';
import { User } from '../users/user.entity';
import { ShareLink, type ShareLinkEntity } from './share-link.entity';
import { recordActivity } from '../activity/activity.service';

// Read-only links to a project for people without an account. What a link shows is what a client of the
// project sees: the frames' designs and the files shared with clients, nothing of the shop.

const view = (l: ShareLinkEntity): ShareLinkDto => ({
  id: l.id,
  expiresAt: l.expiresAt.toISOString(),
  revokedAt: l.revokedAt?.toISOString() ?? null,
  createdAt: l.createdAt.toISOString(),
  createdBy: l.createdBy ? { id: l.createdBy.id, name: l.createdBy.name } : null,
});

export function sharingRouter(orm: Orm, config: Config): Router {
  const router = Router();

  router.get('/projects/:projectId/share-links', async (req, res) => {
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    await authorizeProject(orm.em, currentUserId(req), projectId, 'project.write');
    const rows = await orm.em.find(ShareLink, { project: projectId }, { populate: ['createdBy'], orderBy: { createdAt: 'desc' } });
    res.json(rows.map(view) satisfies ShareLinkDto[]);
  });

  router.post('/projects/:projectId/share-links', async (req, res) => {
    const userId = currentUserId(req);
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const { project } = await authorizeProject(orm.em, userId, projectId, 'project.write');
    const { days } = parseInput(createShareLinkRequestSchema, req.body);
    const { token, hash } = newToken();
    const link = orm.em.create(ShareLink, {
      project,
      tokenHash: hash,
      expiresAt: new Date(Date.now() + days * 86_400_000),
      createdBy: orm.em.getReference(User, userId),
    });
    await orm.em.flush();
    await orm.em.populate(link, ['createdBy']);
    await recordActivity(orm.em, { projectId, userId, kind: 'link.made', subject: `valid ${days} day${days === 1 ? '' : 's'}` });
    res.status(201).json({ ...view(link), token, url: `${config.appUrl}/shared/${token}` } satisfies CreatedShareLink);
  });

  router.delete('/share-links/:shareLinkId', async (req, res) => {
    const { shareLinkId } = parseInput(shareLinkParamsSchema, req.params, 'params');
    const link = await orm.em.findOne(ShareLink, { id: shareLinkId });
    if (!link) throw new NotFoundError('Share link');
    await authorizeProject(orm.em, currentUserId(req), link.project.id, 'project.write');
    const userId = currentUserId(req);
    if (!link.revokedAt) await recordActivity(orm.em, { projectId: link.project.id, userId, kind: 'link.revoked', subject: '' });
    link.revokedAt ??= new Date();
    await orm.em.flush();
    res.status(204).end();
  });

  /** The live link for a token, or 404 (unknown, revoked, expired, or its project deleted). */
  async function openLink(token: string): Promise<ShareLinkEntity> {
    const link = await orm.em.findOne(ShareLink, { tokenHash: hashToken(token) }, { populate: ['project', 'project.workshop'] });
    if (!link || link.revokedAt || link.expiresAt.getTime() <= Date.now() || link.project.deletedAt) throw new NotFoundError('Shared project');
    return link;
  }

  router.get('/shared/:token', async (req, res) => {
    const { token } = parseInput(z.object({ token: tokenSchema }), req.params, 'params');
    const link = await openLink(token);
    const frames = await orm.em.find(Frame, { project: link.project.id, deletedAt: null }, { orderBy: { name: 'asc' } });
    const files = await orm.em.find(Attachment, { project: link.project.id, sharedWithClient: true }, { orderBy: { createdAt: 'desc' } });
    res.set('Cache-Control', 'no-store');
    res.json({
      project: { name: link.project.name, client: link.project.client },
      workshop: link.project.workshop.name,
      expiresAt: link.expiresAt.toISOString(),
      frames: frames.map((f) => ({ id: f.id, name: f.name, version: f.version, updatedAt: f.updatedAt.toISOString(), document: f.document })),
      attachments: files.map((a) => ({ id: a.id, filename: a.filename, contentType: a.contentType, size: a.size })),
    } satisfies SharedProject);
  });

  router.get('/shared/:token/attachments/:attachmentId', async (req, res) => {
    const { token, attachmentId } = parseInput(z.object({ token: tokenSchema, attachmentId: idSchema }), req.params, 'params');
    const link = await openLink(token);
    const a = await orm.em.findOne(Attachment, { id: attachmentId, project: link.project.id, sharedWithClient: true }, { populate: ['data'] });
    if (!a) throw new NotFoundError('Attachment');
    res.setHeader('Content-Type', a.contentType);
    res.set('Content-Disposition', `inline; filename="${encodeURIComponent(a.filename)}"`);
    res.set('Content-Security-Policy', "sandbox; default-src 'none'; img-src 'self'; style-src 'unsafe-inline'");
    res.set('Cache-Control', 'no-store');
    const bytes = await a.data.load();
    res.send(Buffer.from(bytes ?? Buffer.alloc(0)));
  });

  return router;
}
