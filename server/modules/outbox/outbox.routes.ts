import { resolve } from 'node:path';
import { Router } from 'express';
import { z } from 'zod';
import type { OutboxList } from '@shared/api/shop';
import { idSchema } from '@shared/api/common';
import type { Config } from '../../config';
import type { Orm } from '../../db';
import { NotFoundError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { listOutbox, outboxAttachment } from '../../mail/outbox';
import { parseInput } from '../../validate';
import { authorizeWorkshop } from '../access/access.service';
import { sendFile } from '../orders/orders.routes';

// The owner's view of what the project's local test mail server received from this workshop.

const paramsSchema = z.object({ workshopId: idSchema });
const attachmentParams = z.object({ workshopId: idSchema, mailId: z.string().regex(/^[a-z0-9]+-[0-9a-f]{8}$/), index: z.coerce.number().int().min(0).max(50) });

export function outboxRouter(orm: Orm, config: Config): Router {
  const router = Router();
  const dir = resolve(config.mail.fakeDir);

  router.get('/workshops/:workshopId/outbox', async (req, res) => {
    const { workshopId } = parseInput(paramsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'workshop.manage');
    const body: OutboxList = {
      fake: config.mail.fake,
      host: `${config.mail.host}:${config.mail.port}`,
      messages: config.mail.fake
        ? listOutbox(dir, workshopId).map((m) => ({ id: m.id, receivedAt: m.receivedAt, from: m.from, to: m.to, subject: m.subject, text: m.text, kind: m.kind, attachments: m.attachments }))
        : [],
    };
    res.json(body);
  });

  router.get('/workshops/:workshopId/outbox/:mailId/attachments/:index', async (req, res) => {
    const { workshopId, mailId, index } = parseInput(attachmentParams, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'workshop.manage');
    const a = config.mail.fake ? await outboxAttachment(dir, workshopId, mailId, index) : null;
    if (!a) throw new NotFoundError('Attachment');
    sendFile(res, a.content, a.contentType, a.filename);
  });

  return router;
}
