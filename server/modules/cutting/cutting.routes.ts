import { Router } from 'express';
import { z } from 'zod';
import { frameIdParamsSchema, paperSchema, startCuttingSchema, tickRequestSchema } from '@shared/api/shop';
import { idSchema } from '@shared/api/common';
import { cutListCsv, orderListCsv } from '@shared/shop/csv-export';
import { drillSheet } from '@shared/shop/drill-list';
import { shopCutList } from '@shared/shop/from-report';
import { partLabels } from '@shared/shop/labels';
import { orderList } from '@shared/shop/order-list';
import { pickSheet } from '@shared/shop/pick-list';
import { sawSheet } from '@shared/shop/saw-list';
import type { Orm } from '../../db';
import { ForbiddenError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { drillListPdf, labelsPdf, pickListPdf, sawListPdf, sheetPlanPdf } from '../../pdf';
import { frameSheetPlans } from '../orders/sheet-plans';
import { parseInput } from '../../validate';
import { authorizeFrame } from '../access/access.service';
import { frameReport, planFrame, shelfOf, shopMeta, supplierFor, today } from '../orders/frame-shop.service';
import { sendFile } from '../orders/orders.routes';
import { PLAN_TIME_LIMIT_MS } from '../orders/orders.service';
import { cuttingState, latestSession, latestSessionKey, startSession, tick, untick } from './cutting.service';
import { createShopCache, type ShopFile } from './shop-cache';
import { frameHead, type FrameFacts } from '../frames/frame-read';
import type { SupplierEntity } from '../suppliers/supplier.entity';
import { can } from '@shared/api/roles';

const DOCS = ['saw-list.pdf', 'drill-list.pdf', 'pick-list.pdf', 'labels.pdf', 'cut-list.csv', 'order-list.csv', 'sheet-plan.pdf'] as const;

const docQuerySchema = z.object({
  paper: paperSchema.default('A4'),
  units: z.enum(['mm', 'in']).optional(),
  frac: z.enum(['16', '32']).optional(),
  supplierId: idSchema.optional(),
  trim_mm: z.coerce.number().min(0).max(200).optional(),
  minOffcut_mm: z.coerce.number().min(0).max(3000).optional(),
});

export function cuttingRouter(orm: Orm): Router {
  const router = Router();

  router.get('/frames/:frameId/cutting', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, req.params, 'params');
    const { frame, role } = await authorizeFrame(orm.em, currentUserId(req), frameId, 'shop.read');
    res.json(await cuttingState(orm.em, frame, role));
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
      res.json(await cuttingState(orm.em, frame, role));
      return;
    }
    if (existing && !can(role, 'frame.write')) throw new ForbiddenError('Only a designer or owner can start cutting over');
    await startSession(orm.em, frame, userId, input.settings);
    res.status(201).json(await cuttingState(orm.em, frame, role));
  });

  router.post('/frames/:frameId/cutting/ticks', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    const { frame, role } = await authorizeFrame(orm.em, userId, frameId, 'cuts.tick');
    const { cutKey } = parseInput(tickRequestSchema, req.body);
    await tick(orm.em, frame.id, userId, cutKey);
    res.json(await cuttingState(orm.em, frame, role));
  });

  router.delete('/frames/:frameId/cutting/ticks', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, req.params, 'params');
    const { frame, role } = await authorizeFrame(orm.em, currentUserId(req), frameId, 'cuts.tick');
    const { cutKey } = parseInput(tickRequestSchema, req.query, 'query');
    await untick(orm.em, frame.id, cutKey);
    res.json(await cuttingState(orm.em, frame, role));
  });

  // Printed documents and CSV for a frame. The saw list follows the frozen cutting plan when cutting has started on
  // this version, so paper and tablet show the same bars.
  // Each document is made once per (frame version, settings, what it prints) and then served from the cache: the
  // key is worked out from small queries, and only a miss loads the document and runs the engine and planner.
  const cache = createShopCache();
  router.get('/frames/:frameId/shop/:doc', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, { frameId: req.params.frameId }, 'params');
    const doc = parseInput(z.object({ doc: z.enum(DOCS) }), { doc: req.params.doc }, 'params').doc;
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
      supplier: supplier ? [supplier.id, supplier.updatedAt.toISOString()] : null,
      shelf,
      session,
    };
    const made = await cache.file(head, settings, () => makeShopFile(userId, head, doc, q, supplier));
    sendFile(res, made.file.body, made.file.type, made.file.filename);
  });

  async function makeShopFile(
    userId: string,
    head: FrameFacts,
    doc: (typeof DOCS)[number],
    q: z.infer<typeof docQuerySchema>,
    supplierFound: SupplierEntity | null,
  ): Promise<ShopFile> {
    const { frame } = await authorizeFrame(orm.em, userId, head.id, 'shop.read');
    const report = cache.report(head, () => frameReport(frame));
    const units = q.units ? { display: q.units, frac: q.frac === '32' ? (32 as const) : (16 as const) } : undefined;
    const meta = await shopMeta(orm.em, frame, report, { paper: q.paper, units });
    const base = `${frame.name}-r${frame.version}`;
    const settings = { trim_mm: q.trim_mm ?? 10, minOffcut_mm: q.minOffcut_mm ?? 150 };
    if (doc === 'sheet-plan.pdf') {
      return file(await sheetPlanPdf(frameSheetPlans(report), meta), 'application/pdf', `${base}-sheet-plan.pdf`);
    }
    const session = await latestSession(orm.em, frame.id);
    const frozen = doc === 'saw-list.pdf' && session && session.frameVersion === frame.version && !q.supplierId ? session.plan : null;
    const needsPlan = (doc === 'saw-list.pdf' && !frozen) || doc === 'order-list.csv';
    const supplier = needsPlan ? supplierFound : null;
    const planned = needsPlan ? await planFrame(orm.em, frame, report, { supplier, useShelf: true, ...settings, timeLimitMs: PLAN_TIME_LIMIT_MS }) : null;
    const cutList = frozen?.cutList ?? planned?.cutList ?? shopCutList(report);
    switch (doc) {
      case 'saw-list.pdf':
        return file(await sawListPdf(sawSheet(cutList, frozen?.plans ?? planned!.plans, meta)), 'application/pdf', `${base}-saw-list.pdf`);
      case 'drill-list.pdf':
        return file(await drillListPdf(drillSheet(cutList, meta.units), meta), 'application/pdf', `${base}-drill-list.pdf`);
      case 'pick-list.pdf':
        return file(await pickListPdf(pickSheet(cutList), meta), 'application/pdf', `${base}-pick-list.pdf`);
      case 'labels.pdf':
        return file(await labelsPdf(partLabels(cutList, meta), meta), 'application/pdf', `${base}-labels.pdf`);
      case 'cut-list.csv':
        return file(cutListCsv(cutList, meta.units), 'text/csv; charset=utf-8', `${base}-cut-list.csv`);
      case 'order-list.csv':
        return file(orderListCsv(orderList(planned!.planned, supplier?.currency ?? 'EUR', { cutFee: Number(supplier?.cutFee ?? 0) })), 'text/csv; charset=utf-8', `${base}-order-list.csv`);
    }
  }

  return router;
}

const file = (body: Buffer | string, type: string, filename: string): ShopFile => ({ body, type, filename });
