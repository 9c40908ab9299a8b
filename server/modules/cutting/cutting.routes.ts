import { Router } from 'express';
import { z } from 'zod';
import { frameIdParamsSchema, paperSchema, startCuttingSchema, tickRequestSchema } from '@shared/api/shop';
import { idSchema } from '@shared/api/common';
import type { Orm } from '../../db';
import { ForbiddenError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { clientGone, type WorkerPool } from '../../workers/pool';
import { needsPlan, SHOP_DOCS, type ShopDocumentOutput } from '../../workers/shop-document.task';
import { authorizeFrame } from '../access/access.service';
import { offersOf, shelfOf, supplierFor, today } from '../orders/frame-shop.service';
import { sendFile } from '../orders/orders.routes';
import { PLAN_TIME_LIMIT_MS } from '../orders/orders.service';
import { Workshop } from '../workshops/workshop.entity';
import { workshopSettings } from '../workshops/workshop-settings.service';
import { cuttingState, latestSession, latestSessionKey, startSession, tick, untick } from './cutting.service';
import { createShopCache, type ShopFile } from './shop-cache';
import { frameHead, type FrameFacts } from '../frames/frame-read';
import type { SupplierEntity } from '../suppliers/supplier.entity';
import { can } from '@shared/api/roles';

const docQuerySchema = z.object({
  paper: paperSchema.default('A4'),
  units: z.enum(['mm', 'in']).optional(),
  frac: z.enum(['16', '32']).optional(),
  supplierId: idSchema.optional(),
  trim_mm: z.coerce.number().min(0).max(200).optional(),
  minOffcut_mm: z.coerce.number().min(0).max(3000).optional(),
});

export function cuttingRouter(orm: Orm, workers: WorkerPool): Router {
  const router = Router();

  router.get('/frames/:frameId/cutting', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, req.params, 'params');
    const { frame, role } = await authorizeFrame(orm.em, currentUserId(req), frameId, 'shop.read');
    res.json(await cuttingState(orm.em, workers, frame, role));
  });

  // Starts cutting (cutters may, when nothing is started yet); starting over on a changed design is a designer's call.
  router.post('/frames/:frameId/cutting', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    const { frame, role } = await authorizeFrame(orm.em, userId, frameId, 'shop.read');
    if (!can(role, 'cuts.tick') && !can(role, 'frame.write')) throw new ForbiddenError('Only the shop or a designer can start cutting');
    const input = parseInput(startCuttingSchema, req.body);
    const existing = await latestSession(orm.em, frame.id);
    if (existing && !input.restart) {
      res.json(await cuttingState(orm.em, workers, frame, role));
      return;
    }
    if (existing && !can(role, 'frame.write')) throw new ForbiddenError('Only a designer or owner can start cutting over');
    await startSession(orm.em, workers, frame, userId, input.settings);
    res.status(201).json(await cuttingState(orm.em, workers, frame, role));
  });

  router.post('/frames/:frameId/cutting/ticks', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    const { frame, role } = await authorizeFrame(orm.em, userId, frameId, 'cuts.tick');
    const { cutKey } = parseInput(tickRequestSchema, req.body);
    await tick(orm.em, frame.id, userId, cutKey);
    res.json(await cuttingState(orm.em, workers, frame, role));
  });

  router.delete('/frames/:frameId/cutting/ticks', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, req.params, 'params');
    const { frame, role } = await authorizeFrame(orm.em, currentUserId(req), frameId, 'cuts.tick');
    const { cutKey } = parseInput(tickRequestSchema, req.query, 'query');
    await untick(orm.em, frame.id, cutKey);
    res.json(await cuttingState(orm.em, workers, frame, role));
  });

  // Printed documents and CSV for a frame. The saw list follows the frozen cutting plan when cutting has started on
  // this version, so paper and tablet show the same bars.
  // Each document is made once per (frame version, settings, what it prints) and then served from the cache: the
  // key is worked out from small queries, and only a miss loads the document and runs the engine and planner.
  const cache = createShopCache();
  router.get('/frames/:frameId/shop/:doc', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, { frameId: req.params.frameId }, 'params');
    const doc = parseInput(z.object({ doc: z.enum(SHOP_DOCS) }), { doc: req.params.doc }, 'params').doc;
    const q = parseInput(docQuerySchema, req.query, 'query');
    const userId = currentUserId(req);
    const head = await frameHead(orm.em, userId, frameId, 'shop.read');
    const mayUsePlan = doc === 'saw-list.pdf' || doc === 'order-list.csv';
    const [supplier, shelf, session] = mayUsePlan
      ? await Promise.all([supplierFor(orm.em, head.workshopId, q.supplierId), shelfOf(orm.em, head.workshopId), doc === 'saw-list.pdf' ? latestSessionKey(orm.em, frameId) : null])
      : [null, null, null];
    const settings = {
      doc,
      q,
      printed: [head.name, head.projectName, head.workshopName, today()],
      supplier: supplier ? [supplier.id, supplier.updatedAt.toISOString()] : mayUsePlan ? await workshopSettings(orm.em, head.workshopId) : null,
      shelf,
      session,
    };
    const made = await cache.file(head, settings, () => makeShopFile(userId, head, doc, q, supplier, clientGone(res)));
    sendFile(res, made.file.body, made.file.type, made.file.filename);
  });

  async function makeShopFile(
    userId: string,
    head: FrameFacts,
    doc: (typeof SHOP_DOCS)[number],
    q: z.infer<typeof docQuerySchema>,
    supplierFound: SupplierEntity | null,
    signal: ReturnType<typeof clientGone>,
  ): Promise<ShopFile> {
    const { frame } = await authorizeFrame(orm.em, userId, head.id, 'shop.read');
    const units = q.units ? { display: q.units, frac: q.frac === '32' ? (32 as const) : (16 as const) } : undefined;
    const base = `${frame.name}-r${frame.version}`;
    const settings = { trim_mm: q.trim_mm, minOffcut_mm: q.minOffcut_mm };
    const workshop = await orm.em.findOneOrFail(Workshop, { id: frame.project.workshop.id });
    const session = await latestSession(orm.em, frame.id);
    const frozen = doc === 'saw-list.pdf' && session && session.frameVersion === frame.version && !q.supplierId ? session.plan : null;
    const planning = needsPlan(doc, frozen !== null);
    const supplier = planning ? supplierFound : null;
    const shelf = planning ? await shelfOf(orm.em, frame.project.workshop.id) : [];
    const stock = planning && !supplier ? (await workshopSettings(orm.em, frame.project.workshop.id)).stock : [];
    // The report, the plans (bars and sheets) and the document itself are CPU work: a worker thread does them.
    const out = await workers.run<ShopDocumentOutput>(
      {
        task: 'shopDocument',
        input: {
          doc,
          document: frame.document,
          meta: { project: frame.project.name, frame: frame.name, revision: frame.version, date: today(), workshop: workshop.name, units, paper: q.paper },
          frozen,
          offers: offersOf(supplier, stock),
          shelf,
          settings,
          timeLimitMs: PLAN_TIME_LIMIT_MS,
          currency: supplier?.currency ?? 'EUR',
          cutFee: Number(supplier?.cutFee ?? 0),
        },
      },
      signal,
    );
    const body = typeof out.body === 'string' ? out.body : Buffer.from(out.body.buffer, out.body.byteOffset, out.body.byteLength);
    return file(body, out.contentType, `${base}-${out.suffix}`);
  }

  return router;
}

const file = (body: Buffer | string, type: string, filename: string): ShopFile => ({ body, type, filename });
