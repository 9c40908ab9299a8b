import { recordActivity } from '../activity/activity.service';
import { randomBytes } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { OrderContents, OrderDetail, OrderSummary, SendPreview } from '@shared/api/shop';
import type { createOrderSchema } from '@shared/api/shop';
import { orderListCsv } from '@shared/shop/csv-export';
import { lengthText, moneyText } from '@shared/shop/format';
import { orderList, orderText } from '@shared/shop/order-list';
import type { z } from 'zod';
import { ConflictError, HttpError, NotFoundError } from '../../errors';
import type { Mailer } from '../../mail/mailer';
import { MailError } from '../../mail/mailer';
import { orderListPdf } from '../../pdf';
import type { WorkerPool } from '../../workers/pool';
import { Frame } from '../frames/frame.entity';
import { User } from '../users/user.entity';
import { Workshop } from '../workshops/workshop.entity';
import { Supplier } from '../suppliers/supplier.entity';
import { frameReport, planFrame, shopMeta, supplierFor } from './frame-shop.service';
import { Order, type OrderEntity } from './order.entity';

export const PLAN_TIME_LIMIT_MS = 1500;

export function toOrderSummary(o: OrderEntity): OrderSummary {
  const c = o.contents;
  return {
    id: o.id,
    reference: o.reference,
    status: o.status,
    mode: o.mode,
    frame: o.frame ? { id: o.frame.id, name: c.meta.frame } : null,
    frameVersion: o.frameVersion ?? null,
    supplier: o.supplier ? { id: o.supplier.id, name: c.supplierName, email: c.supplierEmail } : null,
    currency: c.order.currency,
    stockTotal: c.order.stockTotal,
    cutToLengthTotal: c.order.cutToLengthTotal,
    barsToBuy: c.order.barsToBuy,
    createdAt: o.createdAt.toISOString(),
    createdBy: o.createdBy ? { id: o.createdBy.id, name: o.createdBy.name } : null,
    sentAt: o.sentAt?.toISOString() ?? null,
    sentTo: o.sentTo ?? null,
    sendError: o.sendError ?? null,
    receivedAt: o.receivedAt?.toISOString() ?? null,
  };
}

export const toOrderDetail = (o: OrderEntity): OrderDetail => ({ ...toOrderSummary(o), contents: o.contents });

export async function listOrders(em: EntityManager, workshopId: string): Promise<OrderSummary[]> {
  const rows = await em.find(Order, { workshop: workshopId }, { orderBy: { createdAt: 'desc' }, populate: ['createdBy'] });
  return rows.map(toOrderSummary);
}

export async function findOrder(em: EntityManager, orderId: string): Promise<OrderEntity> {
  const o = await em.findOne(Order, { id: orderId }, { populate: ['createdBy'], refresh: true });
  if (!o) throw new NotFoundError('Order');
  return o;
}

function newReference(): string {
  const d = new Date().toISOString().slice(2, 10).replace(/-/g, '');
  return `SW-${d}-${randomBytes(2).toString('hex').toUpperCase()}`;
}

/** A draft order from a frame's current design, planned against the supplier's bars (and the shelf's offcuts). */
export async function createOrder(
  em: EntityManager,
  workers: WorkerPool,
  workshopId: string,
  userId: string,
  input: z.output<typeof createOrderSchema>,
): Promise<OrderDetail> {
  const frame = await em.findOne(Frame, { id: input.frameId, deletedAt: null, project: { workshop: workshopId, deletedAt: null } }, { populate: ['project'] });
  if (!frame) throw new HttpError('unprocessable', 'That frame is not in this workshop', { frameId: 'Unknown frame' });
  const supplier = await supplierFor(em, workshopId, input.supplierId);
  if (!supplier) throw new HttpError('unprocessable', 'Choose a supplier', { supplierId: 'Required' });
  const report = await frameReport(frame, workers);
  const plan = await planFrame(em, frame, report, { supplier, useShelf: input.useShelf, ...input.settings, timeLimitMs: PLAN_TIME_LIMIT_MS });
  const meta = await shopMeta(em, frame, report, { paper: input.paper });
  const order = orderList(plan.planned, supplier.currency, { cutFee: Number(supplier.cutFee) }, meta.units);
  const reference = newReference();
  const f = {
    lengthText: (mm: number) => lengthText(mm, meta.units),
    money: (v: number) => moneyText(v, supplier.currency),
    heading: `Order ${reference} from ${meta.workshop}\nFor: ${meta.project}, ${meta.frame} (revision ${meta.revision})`,
  };
  const text = orderText(order, input.mode, f);
  const supplierText = orderText(order, input.mode, { ...f, comparison: false });
  const contents: OrderContents = { meta, order, text, supplierText, supplierName: supplier.name, supplierEmail: supplier.email };
  const o = em.create(Order, {
    workshop: em.getReference(Workshop, workshopId),
    frame,
    supplier,
    reference,
    status: 'draft',
    mode: input.mode,
    frameVersion: frame.version,
    contents,
    createdBy: em.getReference(User, userId),
  });
  await em.flush();
  return toOrderDetail(await findOrder(em, o.id));
}

/** The order list PDF; `forSupplier` leaves out the other way of buying and its prices (the shop's comparison). */
export function orderPdf(o: OrderEntity, forSupplier = false): Promise<Buffer> {
  return orderListPdf(o.contents.order, o.contents.meta, { supplier: o.contents.supplierName, reference: o.reference, mode: o.mode, forSupplier });
}

export function orderCsv(o: OrderEntity): string {
  return orderListCsv(o.contents.order, o.contents.meta.units);
}

/**
 * The e-mail to the supplier as it will go out: to the supplier's order address, the order and what to supply in
 * the chosen way of buying, and the supplier's copy of the PDF. Nothing of the shop's own: no comparison with the
 * other way of buying, no offcuts from its shelf, no client.
 */
export async function supplierMessage(em: EntityManager, o: OrderEntity): Promise<SendPreview> {
  const supplier = o.supplier ? await em.findOne(Supplier, { id: o.supplier.id }) : null;
  return {
    to: supplier?.email ?? o.contents.supplierEmail,
    subject: `Order ${o.reference}: ${o.contents.meta.project} (${o.contents.meta.workshop})`,
    text: `${o.contents.supplierText ?? o.contents.text.split('\n\nFor comparison')[0]}\n\nThe order list is attached as a PDF.\n`,
    attachment: { filename: `order-${o.reference}.pdf`, url: `/api/orders/${o.id}/order.pdf?copy=supplier&view=inline` },
  };
}

/**
 * Sends a draft order once. The draft → sending step is one conditional UPDATE, so of two requests racing (a double
 * click, two people) exactly one goes on to mail; the other gets 409. A mail failure puts the order back to draft
 * with the reason, so it can be sent again.
 */
export async function sendOrder(em: EntityManager, orderId: string, userId: string, mailer: Mailer): Promise<OrderDetail> {
  const claimed = await em.nativeUpdate(Order, { id: orderId, status: 'draft' }, { status: 'sending', sendError: null });
  if (claimed === 0) {
    const current = await findOrder(em, orderId);
    throw new ConflictError(`Order ${current.reference} is already ${current.status}; it is not sent again`, { status: current.status });
  }
  const o = await findOrder(em, orderId);
  const message = await supplierMessage(em, o);
  const to = message.to;
  try {
    const pdf = await orderPdf(o, true);
    const sent = await mailer.send({
      kind: 'order',
      to,
      subject: message.subject,
      text: message.text,
      workshopId: o.workshop.id,
      attachments: [{ filename: message.attachment.filename, content: pdf, contentType: 'application/pdf' }],
    });
    await em.nativeUpdate(Order, { id: orderId, status: 'sending' }, { status: 'sent', sentAt: new Date(), sentBy: userId, sentTo: to, messageId: sent.messageId });
    const frame = o.frame ? await em.findOne(Frame, { id: o.frame.id }, { fields: ['project'] }) : null;
    if (frame) await recordActivity(em, { projectId: frame.project.id, userId, kind: 'order.sent', subject: `${o.reference} to ${o.contents.supplierName}` });
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    await em.nativeUpdate(Order, { id: orderId, status: 'sending' }, { status: 'draft', sendError: reason });
    if (err instanceof MailError) throw new HttpError('unavailable', reason);
    throw err;
  }
  return toOrderDetail(await findOrder(em, orderId));
}

export async function markReceived(em: EntityManager, orderId: string): Promise<OrderDetail> {
  const n = await em.nativeUpdate(Order, { id: orderId, status: 'sent' }, { status: 'received', receivedAt: new Date() });
  if (n === 0) {
    const o = await findOrder(em, orderId);
    throw new ConflictError(`Order ${o.reference} is ${o.status}; only a sent order can be marked received`, { status: o.status });
  }
  return toOrderDetail(await findOrder(em, orderId));
}

export async function deleteDraft(em: EntityManager, orderId: string): Promise<void> {
  const n = await em.nativeDelete(Order, { id: orderId, status: 'draft' });
  if (n === 0) {
    const o = await findOrder(em, orderId);
    throw new ConflictError(`Order ${o.reference} is ${o.status}; only drafts can be deleted`, { status: o.status });
  }
}
