import { Router, type Response } from 'express';
import { createOrderSchema, orderParamsSchema, orderPdfQuerySchema, orderStatusPatchSchema, type SendPreview } from '@shared/api/shop';
import { workshopParamsSchema } from '@shared/api/workshops';
import type { Config } from '../../config';
import type { Orm } from '../../db';
import { currentUserId } from '../../http/current-user';
import { createMailer } from '../../mail/mailer';
import { parseInput } from '../../validate';
import type { WorkerPool } from '../../workers/pool';
import { asNotFound, authorizeWorkshop } from '../access/access.service';
import { createOrder, deleteDraft, findOrder, listOrders, markReceived, orderCsv, orderPdf, sendOrder, supplierMessage, toOrderDetail } from './orders.service';

/** Sends a generated file as a download with a safe file name. */
export function sendFile(res: Response, body: Buffer | string, type: string, filename: string, disposition: 'attachment' | 'inline' = 'attachment'): void {
  const safe = filename.replace(/[^A-Za-z0-9._-]+/g, '-').slice(0, 120);
  res.setHeader('Content-Type', type);
  res.set('Content-Disposition', `${disposition}; filename="${safe}"`);
  res.set('Cache-Control', 'private, no-store');
  res.send(body);
}

export function ordersRouter(orm: Orm, config: Config, workers: WorkerPool): Router {
  const router = Router();

  const orderWithRole = async (userId: string, orderId: string, action: 'read' | 'project.write') => {
    const o = await findOrder(orm.em, orderId);
    await asNotFound('Order', authorizeWorkshop(orm.em, userId, o.workshop.id, action));
    return o;
  };

  router.get('/workshops/:workshopId/orders', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'read');
    res.json(await listOrders(orm.em, workshopId));
  });

  router.post('/workshops/:workshopId/orders', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    await authorizeWorkshop(orm.em, userId, workshopId, 'project.write');
    res.status(201).json(await createOrder(orm.em, workers, workshopId, userId, parseInput(createOrderSchema, req.body)));
  });

  router.get('/orders/:orderId', async (req, res) => {
    const { orderId } = parseInput(orderParamsSchema, req.params, 'params');
    res.json(toOrderDetail(await orderWithRole(currentUserId(req), orderId, 'read')));
  });

  router.get('/orders/:orderId/order.pdf', async (req, res) => {
    const { orderId } = parseInput(orderParamsSchema, req.params, 'params');
    const { copy, view } = parseInput(orderPdfQuerySchema, req.query, 'query');
    const o = await orderWithRole(currentUserId(req), orderId, 'read');
    sendFile(res, await orderPdf(o, copy === 'supplier'), 'application/pdf', `order-${o.reference}.pdf`, view === 'inline' ? 'inline' : 'attachment');
  });

  // What "Send" would mail, to show and confirm first; for those who may send.
  router.get('/orders/:orderId/send-preview', async (req, res) => {
    const { orderId } = parseInput(orderParamsSchema, req.params, 'params');
    const o = await orderWithRole(currentUserId(req), orderId, 'project.write');
    res.json((await supplierMessage(orm.em, o)) satisfies SendPreview);
  });

  router.get('/orders/:orderId/order.csv', async (req, res) => {
    const { orderId } = parseInput(orderParamsSchema, req.params, 'params');
    const o = await orderWithRole(currentUserId(req), orderId, 'read');
    sendFile(res, orderCsv(o), 'text/csv; charset=utf-8', `order-${o.reference}.csv`);
  });

  router.post('/orders/:orderId/send', async (req, res) => {
    const { orderId } = parseInput(orderParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    await orderWithRole(userId, orderId, 'project.write');
    const mailer = createMailer(config.mail);
    try {
      res.json(await sendOrder(orm.em, orderId, userId, mailer));
    } finally {
      mailer.close();
    }
  });

  router.patch('/orders/:orderId', async (req, res) => {
    const { orderId } = parseInput(orderParamsSchema, req.params, 'params');
    await orderWithRole(currentUserId(req), orderId, 'project.write');
    parseInput(orderStatusPatchSchema, req.body);
    res.json(await markReceived(orm.em, orderId));
  });

  router.delete('/orders/:orderId', async (req, res) => {
    const { orderId } = parseInput(orderParamsSchema, req.params, 'params');
    await orderWithRole(currentUserId(req), orderId, 'project.write');
    await deleteDraft(orm.em, orderId);
    res.status(204).end();
  });

  return router;
}
