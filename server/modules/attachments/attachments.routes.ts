import { Router, type Request } from 'express';
import { ATTACHMENT_TYPES, MAX_ATTACHMENT_BYTES, attachmentParamsSchema, updateAttachmentRequestSchema, type AttachmentView } from '@shared/api/shop';
import { can } from '@shared/api/roles';
import { projectParamsSchema } from '@shared/api/projects';
import type { Orm } from '../../db';
import { ForbiddenError, NotFoundError, ValidationError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { authorizeProject } from '../access/access.service';
import { singleFile } from '../orders/upload';
import { User } from '../users/user.entity';
import { Attachment, type AttachmentEntity } from './attachment.entity';
import { sniffType } from './sniff';

// Photos and PDF data sheets on a project. The type is decided from the file's first bytes, not from what the
// browser claims, and only members of the project's workshop can fetch one.

const MAX_PER_PROJECT = 200;

const view = (a: AttachmentEntity): AttachmentView => ({
  id: a.id,
  filename: a.filename,
  contentType: a.contentType,
  size: a.size,
  createdAt: a.createdAt.toISOString(),
  uploadedBy: a.uploadedBy ? { id: a.uploadedBy.id, name: a.uploadedBy.name } : null,
  sharedWithClient: a.sharedWithClient,
});

function cleanName(name: string): string {
  const base = Buffer.from(name, 'latin1').toString('utf8');
  return base.replace(/[\\/\0\r\n"]+/g, '_').trim().slice(0, 150) || 'file';
}

export function attachmentsRouter(orm: Orm): Router {
  const router = Router();
  const mayAttach = async (req: Request) => {
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    await authorizeProject(orm.em, currentUserId(req), projectId, 'project.write');
  };

  router.get('/projects/:projectId/attachments', async (req, res) => {
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const { role } = await authorizeProject(orm.em, currentUserId(req), projectId, 'read');
    const shown = can(role, 'shop.read') ? {} : { sharedWithClient: true };
    const rows = await orm.em.find(Attachment, { project: projectId, ...shown }, { orderBy: { createdAt: 'desc' }, populate: ['uploadedBy'] });
    res.json(rows.map(view));
  });

  router.post('/projects/:projectId/attachments', singleFile('file', MAX_ATTACHMENT_BYTES, mayAttach), async (req, res) => {
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    const { project } = await authorizeProject(orm.em, userId, projectId, 'project.write');
    const file = req.file;
    if (!file || file.size === 0) throw new ValidationError({ file: 'Choose a photo or PDF to attach' });
    const type = sniffType(file.buffer);
    if (!type) throw new ValidationError({ file: 'Only JPEG, PNG or WebP photos and PDF files can be attached' });
    if ((await orm.em.count(Attachment, { project: projectId })) >= MAX_PER_PROJECT) throw new ValidationError({ file: `A project holds at most ${MAX_PER_PROJECT} files` });
    const a = orm.em.create(Attachment, { project, filename: cleanName(file.originalname), contentType: type, size: file.size, data: file.buffer, uploadedBy: orm.em.getReference(User, userId) });
    await orm.em.flush();
    await orm.em.populate(a, ['uploadedBy']);
    res.status(201).json(view(a));
  });

  router.get('/attachments/:attachmentId', async (req, res) => {
    const { attachmentId } = parseInput(attachmentParamsSchema, req.params, 'params');
    const a = await orm.em.findOne(Attachment, { id: attachmentId }, { populate: ['data'] });
    if (!a) throw new NotFoundError('Attachment');
    const { role } = await authorizeProject(orm.em, currentUserId(req), a.project.id, 'read').catch(() => {
      throw new NotFoundError('Attachment');
    });
    if (!can(role, 'shop.read') && !a.sharedWithClient) throw new NotFoundError('Attachment');
    res.setHeader('Content-Type', a.contentType);
    res.set('Content-Disposition', `${a.contentType === 'application/pdf' ? 'inline' : 'inline'}; filename="${encodeURIComponent(a.filename)}"`);
    res.set('Content-Security-Policy', "sandbox; default-src 'none'; img-src 'self'; style-src 'unsafe-inline'");
    res.set('Cache-Control', 'private, max-age=300');
    const bytes = await a.data.load();
    res.send(Buffer.from(bytes ?? Buffer.alloc(0)));
  });

  router.patch('/attachments/:attachmentId', async (req, res) => {
    const { attachmentId } = parseInput(attachmentParamsSchema, req.params, 'params');
    const a = await orm.em.findOne(Attachment, { id: attachmentId }, { populate: ['uploadedBy'] });
    if (!a) throw new NotFoundError('Attachment');
    await authorizeProject(orm.em, currentUserId(req), a.project.id, 'project.write').catch((err: unknown) => {
      throw err instanceof ForbiddenError ? err : new NotFoundError('Attachment');
    });
    const { sharedWithClient } = parseInput(updateAttachmentRequestSchema, req.body);
    a.sharedWithClient = sharedWithClient;
    await orm.em.flush();
    res.json(view(a));
  });

  router.delete('/attachments/:attachmentId', async (req, res) => {
    const { attachmentId } = parseInput(attachmentParamsSchema, req.params, 'params');
    const a = await orm.em.findOne(Attachment, { id: attachmentId });
    if (!a) throw new NotFoundError('Attachment');
    // One 404 whether the attachment is missing or in another workshop.
    await authorizeProject(orm.em, currentUserId(req), a.project.id, 'project.write').catch((err: unknown) => {
      throw err instanceof NotFoundError ? new NotFoundError('Attachment') : err;
    });
    await orm.em.nativeDelete(Attachment, { id: a.id });
    res.status(204).end();
  });

  return router;
}
