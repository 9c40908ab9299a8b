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
import { frameReport, planFrame, shopMeta, supplierFor } from '../orders/frame-shop.service';
import { sendFile } from '../orders/orders.routes';
import { PLAN_TIME_LIMIT_MS } from '../orders/orders.service';
import { cuttingState, latestSession, startSession, tick, untick } from './cutting.service';
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
  router.get('/frames/:frameId/shop/:doc', async (req, res) => {
    const { frameId } = parseInput(frameIdParamsSchema, { frameId: req.params.frameId }, 'params');
    const doc = parseInput(z.object({ doc: z.enum(DOCS) }), { doc: req.params.doc }, 'params').doc;
    const q = parseInput(docQuerySchema, req.query, 'query');
    const { frame } = await authorizeFrame(orm.em, currentUserId(req), frameId, 'shop.read');
    const report = frameReport(frame);
    const units = q.units ? { display: q.units, frac: q.frac === '32' ? (32 as const) : (16 as const) } : undefined;
    const meta = await shopMeta(orm.em, frame, report, { paper: q.paper, units });
    const base = `${frame.name}-r${frame.version}`;
    const settings = { trim_mm: q.trim_mm ?? 10, minOffcut_mm: q.minOffcut_mm ?? 150 };
    if (doc === 'sheet-plan.pdf') {
      return sendFile(res, await sheetPlanPdf(frameSheetPlans(report), meta), 'application/pdf', `${base}-sheet-plan.pdf`);
    }
    const session = await latestSession(orm.em, frame.id);
    const frozen = doc === 'saw-list.pdf' && session && session.frameVersion === frame.version && !q.supplierId ? session.plan : null;
    const needsPlan = (doc === 'saw-list.pdf' && !frozen) || doc === 'order-list.csv';
    const supplier = needsPlan ? await supplierFor(orm.em, frame.project.workshop.id, q.supplierId) : null;
    const planned = needsPlan ? await planFrame(orm.em, frame, report, { supplier, useShelf: true, ...settings, timeLimitMs: PLAN_TIME_LIMIT_MS }) : null;
    const cutList = frozen?.cutList ?? planned?.cutList ?? shopCutList(report);
    switch (doc) {
      case 'saw-list.pdf':
        return sendFile(res, await sawListPdf(sawSheet(cutList, frozen?.plans ?? planned!.plans, meta)), 'application/pdf', `${base}-saw-list.pdf`);
      case 'drill-list.pdf':
        return sendFile(res, await drillListPdf(drillSheet(cutList, meta.units), meta), 'application/pdf', `${base}-drill-list.pdf`);
      case 'pick-list.pdf':
        return sendFile(res, await pickListPdf(pickSheet(cutList), meta), 'application/pdf', `${base}-pick-list.pdf`);
      case 'labels.pdf':
        return sendFile(res, await labelsPdf(partLabels(cutList, meta), meta), 'application/pdf', `${base}-labels.pdf`);
      case 'cut-list.csv':
        return sendFile(res, cutListCsv(cutList, meta.units), 'text/csv; charset=utf-8', `${base}-cut-list.csv`);
      case 'order-list.csv':
        return sendFile(res, orderListCsv(orderList(planned!.planned, supplier?.currency ?? 'EUR', { cutFee: Number(supplier?.cutFee ?? 0) })), 'text/csv; charset=utf-8', `${base}-order-list.csv`);
    }
  });

  return router;
}
