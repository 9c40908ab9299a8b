import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import type { OrderDetail, SendPreview, Supplier } from '@shared/api/shop';
import { StockOffcut } from '../../server/modules/stock/stock-offcut.entity';
import { Workshop } from '../../server/modules/workshops/workshop.entity';
import { ACTORS, EDITORS, MEMBERS, refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';
import { pdfText } from '../support/pdf-text';
import { outboxAttachment } from '../../server/mail/outbox';

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor) => w.clients.get(a)!;
const binaryParser = (r: import('supertest').Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  const stream = r as unknown as NodeJS.ReadableStream;
  stream.on('data', (d: Buffer) => chunks.push(d));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
};

const supplierBody = {
  name: 'Northgate Metals',
  email: 'orders@northgate.test',
  currency: 'EUR',
  stock: [
    { profile: '30x30-s8', length_mm: 6000, price: 38 },
    { profile: null, length_mm: 3000, price: 21 },
  ],
  cutFee: 1.2,
};

describe('suppliers', () => {
  it.each(ACTORS)('%s: create follows the role (owner and designer only)', async (a) => {
    const res = await c(a).post(`/api/workshops/${w.workshopId}/suppliers`, { ...supplierBody, name: `Supplier by ${a}` });
    expect(res.status).toBe(EDITORS.includes(a) ? 201 : refusal(a));
  });

  it.each(ACTORS)('%s: list is for members', async (a) => {
    const res = await c(a).get(`/api/workshops/${w.workshopId}/suppliers`);
    expect(res.status).toBe(MEMBERS.includes(a) ? 200 : refusal(a));
    if (res.status === 200) expect((res.body as Supplier[]).map((s) => s.name).sort()).toEqual(['Supplier by designer', 'Supplier by owner']);
  });

  it('names bad fields and keeps nothing', async () => {
    const res = await c('owner').post(`/api/workshops/${w.workshopId}/suppliers`, { ...supplierBody, email: 'not-mail', currency: 'euro', stock: [{ profile: null, length_mm: -1, price: 1 }] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['currency', 'email', 'stock.0.length_mm']);
  });

  it('edits and deletes, by role', async () => {
    const list = (await c('owner').get(`/api/workshops/${w.workshopId}/suppliers`)).body as Supplier[];
    const id = list[0].id;
    expect((await c('cutter').patch(`/api/suppliers/${id}`, { cutFee: 2 })).status).toBe(403);
    expect((await c('outsider').patch(`/api/suppliers/${id}`, { cutFee: 2 })).status).toBe(404);
    const ok = await c('designer').patch(`/api/suppliers/${id}`, { cutFee: 2 });
    expect(ok.status).toBe(200);
    expect(ok.body.cutFee).toBe(2);
    expect((await c('viewer').delete(`/api/suppliers/${id}`)).status).toBe(403);
    expect((await c('owner').delete(`/api/suppliers/${id}`)).status).toBe(204);
  });
});

describe('orders', () => {
  let supplierId: string;
  let order: OrderDetail;

  beforeAll(async () => {
    supplierId = (await c('owner').post(`/api/workshops/${w.workshopId}/suppliers`, supplierBody).expect(201)).body.id;
  });

  it.each(['cutter', 'viewer', 'outsider', 'anonymous'] as Actor[])('%s cannot make an order', async (a) => {
    const res = await c(a).post(`/api/workshops/${w.workshopId}/orders`, { frameId: w.frameId, supplierId });
    expect(res.status).toBe(refusal(a));
  });

  it('makes a draft order from the frame: bars by profile and length with cost, and the cut-to-length alternative', async () => {
    const res = await c('designer').post(`/api/workshops/${w.workshopId}/orders`, { frameId: w.frameId, supplierId, mode: 'stock' });
    expect(res.status).toBe(201);
    order = res.body as OrderDetail;
    expect(order.status).toBe('draft');
    expect(order.reference).toMatch(/^SW-\d{6}-[0-9A-F]{4}$/);
    const p = order.contents.order.profiles;
    expect(p.map((x) => x.profileId)).toEqual(['30x30-s8']);
    // every bar bought is one the supplier sells, and the cost is the sum of their prices
    const lines = p[0].order.stock.lines;
    for (const l of lines) expect([6000, 3000]).toContain(l.stockLength);
    expect(order.stockTotal).toBeCloseTo(lines.reduce((s, l) => s + l.qty * (l.stockLength === 6000 ? 38 : 21), 0), 6);
    // the cut-to-length side holds every part of the frame exactly once
    const parts = p[0].order.cutToLength.lines.reduce((n, l) => n + l.qty, 0);
    expect(parts).toBe(order.contents.order.cutCount);
    expect(order.contents.text).toContain('Stock bars to buy');
  });

  it('serves the order as PDF and CSV to members only', async () => {
    const pdf = await c('viewer').get(`/api/orders/${order.id}/order.pdf`).buffer(true).parse(binaryParser);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    const { text } = await pdfText(pdf.body as Buffer);
    expect(text).toContain(order.reference);
    expect(text).toContain('Northgate Metals');
    const csv = await c('cutter').get(`/api/orders/${order.id}/order.csv`);
    expect(csv.status).toBe(200);
    const rows = Papa.parse<string[]>(csv.text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data;
    expect(rows[0][0]).toBe('Buy as');
    expect((await c('outsider').get(`/api/orders/${order.id}/order.csv`)).status).toBe(404);
  });

  it('a cutter cannot send; the owner sends once: the mail arrives at the SMTP server with the PDF', async () => {
    expect((await c('cutter').post(`/api/orders/${order.id}/send`)).status).toBe(403);
    const arrived = w.fake.next();
    const res = await c('owner').post(`/api/orders/${order.id}/send`);
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('sent');
    expect(res.body.sentTo).toBe('orders@northgate.test');
    const mail = await arrived;
    expect(mail.envelopeTo).toEqual(['orders@northgate.test']);
    expect(mail.subject).toContain(order.reference);
    expect(mail.text).toContain('Stock bars to buy');
    // the supplier gets what to supply, not the shop's own comparison with buying cut to length
    expect(mail.text).not.toMatch(/comparison|cut to length|cut-to-length/i);
    const pdf = await outboxAttachment(w.mailDir, w.workshopId, mail.id, 0);
    const { text: pdfWords } = await pdfText(pdf!.content);
    expect(pdfWords).toContain('Stock bars');
    expect(pdfWords).not.toContain('Cut to length by the supplier');
    expect(pdfWords).not.toContain('Cut to length total');
    expect(mail.attachments).toEqual([expect.objectContaining({ filename: `order-${order.reference}.pdf`, contentType: 'application/pdf' })]);
    expect(mail.workshopId).toBe(w.workshopId);
  });

  it('refuses a second send and mails nothing more', async () => {
    const before = w.fake.received().length;
    const res = await c('designer').post(`/api/orders/${order.id}/send`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/already sent/);
    expect(w.fake.received().length).toBe(before);
  });

  it('two sends racing on a new draft mail exactly once', async () => {
    const draft = (await c('owner').post(`/api/workshops/${w.workshopId}/orders`, { frameId: w.frameId, supplierId, mode: 'cut-to-length' }).expect(201)).body as OrderDetail;
    const before = w.fake.received().length;
    const [a, b] = await Promise.all([c('owner').post(`/api/orders/${draft.id}/send`), c('designer').post(`/api/orders/${draft.id}/send`)]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect(w.fake.received().length).toBe(before + 1);
    // the supplier is asked for the parts cut to length, and not shown what the shop compared them with
    expect(w.fake.received().at(-1)!.text).toContain('Parts cut to length');
    expect(w.fake.received().at(-1)!.text).not.toMatch(/stock bars|comparison/i);
  });

  it('marks a sent order received (once), and refuses to delete it', async () => {
    expect((await c('viewer').patch(`/api/orders/${order.id}`, { status: 'received' })).status).toBe(403);
    const ok = await c('owner').patch(`/api/orders/${order.id}`, { status: 'received' });
    expect(ok.status).toBe(200);
    expect(ok.body.status).toBe('received');
    expect((await c('owner').patch(`/api/orders/${order.id}`, { status: 'received' })).status).toBe(409);
    expect((await c('owner').delete(`/api/orders/${order.id}`)).status).toBe(409);
  });

  it('shows the e-mail and the supplier’s PDF before sending, exactly as they go out, with nothing of the shop’s own', async () => {
    // An offcut on the shelf: the shop's copy lists it, the supplier's does not (it is not bought).
    const em = w.ctx.orm.em.fork();
    const shelf = em.create(StockOffcut, { workshop: em.getReference(Workshop, w.workshopId), profile: '30x30-s8', lengthMm: 5900, qty: 1 });
    await em.flush();
    const draft = (await c('owner').post(`/api/workshops/${w.workshopId}/orders`, { frameId: w.frameId, supplierId, mode: 'stock' }).expect(201)).body as OrderDetail;
    expect(draft.contents.text).toMatch(/For comparison/);
    for (const a of ACTORS) {
      const res = await c(a).get(`/api/orders/${draft.id}/send-preview`);
      expect(res.status).toBe(EDITORS.includes(a) ? 200 : refusal(a));
    }
    const before = w.fake.received().length;
    const preview = (await c('designer').get(`/api/orders/${draft.id}/send-preview`).expect(200)).body as SendPreview;
    // Looking sends nothing.
    expect(w.fake.received().length).toBe(before);
    expect((await c('owner').get(`/api/orders/${draft.id}`)).body.status).toBe('draft');
    expect(preview.to).toBe('orders@northgate.test');
    expect(preview.text).not.toMatch(/comparison|cut to length|price per metre|on hand|offcut/i);

    const copy = await c('designer').get(preview.attachment.url).buffer(true).parse(binaryParser);
    expect(copy.status).toBe(200);
    const supplierPdf = (await pdfText(copy.body as Buffer)).text;
    const shopPdf = (await pdfText((await c('designer').get(`/api/orders/${draft.id}/order.pdf`).buffer(true).parse(binaryParser)).body as Buffer)).text;
    // The facts block prints its labels in capitals: compared without case.
    const internal = ['offcut on hand', 'cut to length total', 'cut to length by the supplier', 'per metre'];
    for (const words of internal) expect(shopPdf.toLowerCase()).toContain(words);
    for (const words of internal) expect(supplierPdf.toLowerCase()).not.toContain(words);
    expect(supplierPdf).toContain(draft.reference);
    expect((await c('designer').get(`/api/orders/${draft.id}/order.pdf?copy=everything`)).status).toBe(400);

    const arrived = w.fake.next();
    await c('designer').post(`/api/orders/${draft.id}/send`).expect(200);
    const mail = await arrived;
    expect([mail.envelopeTo, mail.subject, mail.text.trim()]).toEqual([[preview.to], preview.subject, preview.text.trim()]);
    expect(mail.attachments.map((a) => a.filename)).toEqual([preview.attachment.filename]);
    const sentPdf = await outboxAttachment(w.mailDir, w.workshopId, mail.id, 0);
    expect((await pdfText(sentPdf!.content)).text).toBe(supplierPdf);
    // The shelf as the later tests expect it.
    await em.nativeDelete(StockOffcut, { id: shelf.id });
  });

  it('lists orders for members with their status', async () => {
    for (const a of ACTORS) {
      const res = await c(a).get(`/api/workshops/${w.workshopId}/orders`);
      expect(res.status).toBe(MEMBERS.includes(a) ? 200 : refusal(a));
    }
    const list = (await c('viewer').get(`/api/workshops/${w.workshopId}/orders`)).body as { status: string }[];
    expect(list.map((o) => o.status).sort()).toEqual(['received', 'sent', 'sent']);
  });

  it('a mail server that is down leaves the order a draft with the reason, to send again later', async () => {
    const draft = (await c('owner').post(`/api/workshops/${w.workshopId}/orders`, { frameId: w.frameId, supplierId }).expect(201)).body as OrderDetail;
    await w.fake.close();
    const res = await c('owner').post(`/api/orders/${draft.id}/send`);
    expect(res.status).toBe(503);
    const after = (await c('owner').get(`/api/orders/${draft.id}`)).body as OrderDetail;
    expect(after.status).toBe('draft');
    expect(after.sendError).toMatch(/did not take the message/);
  });
});

describe('outbox (owner only)', () => {
  it.each(ACTORS)('%s', async (a) => {
    const res = await c(a).get(`/api/workshops/${w.workshopId}/outbox`);
    expect(res.status).toBe(a === 'owner' ? 200 : refusal(a));
    if (a === 'owner') {
      expect(res.body.fake).toBe(true);
      // The order sent first, the one of the two racing sends that won, and the one sent after its preview.
      expect(res.body.messages.length).toBe(3);
      const m = res.body.messages[0];
      const att = await c('owner').get(`/api/workshops/${w.workshopId}/outbox/${m.id}/attachments/0`);
      expect(att.status).toBe(200);
      expect(att.headers['content-type']).toBe('application/pdf');
      expect((await c('designer').get(`/api/workshops/${w.workshopId}/outbox/${m.id}/attachments/0`)).status).toBe(403);
    }
  });
});
