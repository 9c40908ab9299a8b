import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { CuttingState, OrderDetail } from '@shared/api/shop';
import type { WorkshopSettingsInput, WorkshopSettingsView } from '@shared/api/workshop-settings';
import { dateText } from '@shared/display/format';
import { computeReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';
import { ACTORS, demoDocument, MEMBERS, refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';
import { pdfText } from '../support/pdf-text';

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor) => w.clients.get(a)!;
const url = () => `/api/workshops/${w.workshopId}/settings`;
const binary = (res: import('supertest').Test) =>
  res.buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (d: Buffer) => chunks.push(d));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
const csvRows = (text: string): string[][] => Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data;

/**
 * A tape reading worked out here, apart from the product's formatter: 1 in = 25.4 mm exactly (NIST SP 811, B.8;
 * US Federal Register, 1 July 1959), rounded to the nearest 1/32 and the fraction reduced.
 */
function inches32(mm: number): string {
  const steps = Math.round(mm / 25.4 * 32);
  const whole = Math.floor(steps / 32);
  let num = steps % 32;
  let den = 32;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  return num === 0 ? `${whole}"` : `${whole} ${num}/${den}"`;
}

/** The demo frame without its own units and shop settings, as a new frame that takes the workshop's. */
function bareDemo(): Record<string, unknown> {
  const d = demoDocument() as unknown as Record<string, unknown>;
  const { units: _u, settings: _s, ...rest } = d;
  return rest;
}

const INCH_SHOP: WorkshopSettingsInput = {
  units: { length: 'in', frac: 32, mass: 'lb', date: 'dmy' },
  kerf_mm: 2.5,
  trim_mm: 20,
  minOffcut_mm: 300,
  deflectionLimitN: 360,
  shockFactor: 3,
  sparesPct: 5,
  defaultJoin: 'gusset',
  defaultProfile: '40x40-s8',
  stock: [{ length_mm: 6096, price: 30 }],
};

describe('workshop settings', () => {
  it.each(ACTORS)('%s: reading them is for members; only the owner may edit', async (a) => {
    const res = await c(a).get(url());
    expect(res.status).toBe(MEMBERS.includes(a) ? 200 : refusal(a === 'anonymous' ? a : 'outsider'));
    if (res.status !== 200) return;
    const view = res.body as WorkshopSettingsView;
    // The built-in defaults: mm, ISO dates, trim 10 mm and shortest offcut 150 mm (settings.ts, common practice).
    expect(view.settings.units).toEqual({ length: 'mm', frac: 16, mass: 'kg', date: 'iso', decimalComma: false });
    expect([view.settings.trim_mm, view.settings.minOffcut_mm]).toEqual([10, 150]);
    expect(view.canEdit).toBe(a === 'owner');
  });

  it.each(['designer', 'cutter', 'viewer', 'outsider', 'anonymous'] as Actor[])('%s cannot change them', async (a) => {
    const res = await c(a).put(url(), INCH_SHOP);
    expect(res.status).toBe(a === 'anonymous' ? 401 : a === 'outsider' ? 404 : 403);
    expect((await c('owner').get(url())).body.settings.units.length).toBe('mm');
  });

  it('refuses values out of bounds, naming each field, and keeps what was saved', async () => {
    const res = await c('owner').put(url(), {
      ...INCH_SHOP,
      units: { length: 'ft', frac: 8 },
      kerf_mm: 25,
      trim_mm: -1,
      minOffcut_mm: 5000,
      shockFactor: 0.5,
      defaultProfile: 'no-such-profile',
      stock: [{ length_mm: 50, price: -1 }],
      colour: 'red',
    });
    expect(res.status).toBe(400);
    const fields = Object.keys(res.body.error.fields);
    expect(fields).toContain('body');
    for (const f of ['units.length', 'units.frac', 'kerf_mm', 'trim_mm', 'minOffcut_mm', 'shockFactor', 'defaultProfile', 'stock.0.length_mm', 'stock.0.price']) expect(fields).toContain(f);
    expect((await c('owner').get(url())).body.settings.kerf_mm).toBe(3);
  });

  it('the owner saves them, and a new frame takes them', async () => {
    const saved = await c('owner').put(url(), INCH_SHOP);
    expect(saved.status).toBe(200);
    expect(saved.body.settings.units).toEqual({ length: 'in', frac: 32, mass: 'lb', date: 'dmy', decimalComma: false });
    const made = await c('designer').post(`/api/projects/${w.projectId}/frames`, { name: 'Blank bench' });
    expect(made.status).toBe(201);
    const doc = made.body.document;
    expect(doc.units).toEqual({ display: 'in', frac: 32, mass: 'lb', date: 'dmy', decimalComma: false });
    expect(doc.settings).toMatchObject({ kerf_mm: 2.5, trim_mm: 20, minOffcut_mm: 300, deflectionLimitN: 360, shockFactor: 3, sparesPct: 5, defaultJoin: 'gusset', defaultProfile: '40x40-s8' });
  });

  it('a document sent with its own settings keeps them: the frame’s value wins', async () => {
    const own = { ...bareDemo(), units: { display: 'mm', frac: 16 }, settings: { kerf_mm: 4, trim_mm: 5 } };
    const made = await c('designer').post(`/api/projects/${w.projectId}/frames`, { name: 'Own kerf', document: own });
    expect(made.status).toBe(201);
    expect(made.body.document.units.display).toBe('mm');
    expect(made.body.document.settings).toMatchObject({ kerf_mm: 4, trim_mm: 5, minOffcut_mm: 300, shockFactor: 3 });
  });
});

describe('an inch frame’s shop outputs', () => {
  let frameId: string;
  let lengths: number[];
  const doc = (name: string) => binary(c('cutter').get(`/api/frames/${frameId}/shop/${name}`));

  it('is made under the inch workshop', async () => {
    await c('owner').put(url(), INCH_SHOP).expect(200);
    const made = await c('designer').post(`/api/projects/${w.projectId}/frames`, { name: 'Inch pod', document: bareDemo() });
    expect(made.status).toBe(201);
    frameId = made.body.id;
    lengths = [...new Set(computeReport(parseFrameDocument(made.body.document)).cut_list.map((l) => l.cut_length_mm))];
    expect(lengths.length).toBeGreaterThan(1);
  });

  it('saw list PDF: every cut length in 32nds of an inch, the date day first', async () => {
    const res = await doc('saw-list.pdf');
    expect(res.status).toBe(200);
    const { text } = await pdfText(res.body as Buffer);
    for (const mm of lengths) expect(text).toContain(inches32(mm));
    expect(text).not.toMatch(/\b\d+(\.\d)? mm\b/);
    expect(text).toContain('inches to 1/32');
    expect(text).toContain(dateText(new Date().toISOString().slice(0, 10), { date: 'dmy' }));
    // the workshop's own 6096 mm (20 ft) bar is what it buys with no supplier: 6096 / 25.4 = 240 in exactly
    expect(text).toContain('240"');
  });

  it('labels PDF in inches', async () => {
    const labels = await pdfText((await doc('labels.pdf')).body as Buffer);
    for (const mm of lengths) expect(labels.text).toContain(inches32(mm));
    expect(labels.text).not.toMatch(/\b\d+(\.\d)? mm\b/);
  });

  it('cut-list CSV: the length column in inches, beside millimetres', async () => {
    const res = await c('cutter').get(`/api/frames/${frameId}/shop/cut-list.csv`);
    expect(res.status).toBe(200);
    const rows = csvRows(res.text);
    expect(rows[0].slice(3, 5)).toEqual(['Cut length (mm)', 'Cut length']);
    for (const r of rows.slice(1)) expect(r[4]).toBe(inches32(Number(r[3])));
  });

  it('order list, its CSV and the supplier’s e-mail in inches', async () => {
    const supplierId = (
      await c('owner')
        .post(`/api/workshops/${w.workshopId}/suppliers`, { name: 'Inch Metals', email: 'orders@inch.test', currency: 'USD', stock: [{ profile: null, length_mm: 6096, price: 30 }] })
        .expect(201)
    ).body.id;
    const made = await c('designer').post(`/api/workshops/${w.workshopId}/orders`, { frameId, supplierId, mode: 'stock' });
    expect(made.status).toBe(201);
    const order = made.body as OrderDetail;
    expect(order.contents.text).toContain('240" bars');
    const csv = csvRows((await c('viewer').get(`/api/orders/${order.id}/order.csv`)).text);
    expect(csv[1].slice(2, 4)).toEqual(['6096', '240"']);
    const pdf = await pdfText((await binary(c('viewer').get(`/api/orders/${order.id}/order.pdf`))).body as Buffer);
    expect(pdf.text).toContain('240"');
    const arrived = w.fake.next();
    expect((await c('owner').post(`/api/orders/${order.id}/send`)).status).toBe(200);
    const mail = await arrived;
    expect(mail.text).toContain('240" bars');
    expect(mail.text).not.toMatch(/\b\d+ mm\b/);
  });

  it('a frame set back to millimetres prints in millimetres though the workshop works in inches', async () => {
    const current = (await c('designer').get(`/api/frames/${frameId}`)).body;
    const document = { ...current.document, units: { ...current.document.units, display: 'mm' } };
    expect((await c('designer').put(`/api/frames/${frameId}/document`, { baseVersion: current.version, document })).status).toBe(200);
    const { text } = await pdfText((await doc('labels.pdf')).body as Buffer);
    expect(text).toMatch(/\b\d+(\.\d)? mm\b/);
    expect(text).not.toContain(inches32(lengths[0]));
  });
});

describe('trim and shortest offcut reach the cutting plan', () => {
  async function planWith(settings: { trim_mm: number; minOffcut_mm: number }) {
    const document = { ...bareDemo(), settings };
    const made = await c('designer').post(`/api/projects/${w.projectId}/frames`, { name: `Trim ${settings.trim_mm}`, document });
    expect(made.status).toBe(201);
    const res = await c('cutter').post(`/api/frames/${made.body.id}/cutting`, {});
    expect(res.status).toBe(201);
    return (res.body as CuttingState).session!.plan;
  }

  it('the frame’s trim and shortest offcut, not fixed ones, shape the plan', async () => {
    const loose = await planWith({ trim_mm: 0, minOffcut_mm: 0 });
    const tight = await planWith({ trim_mm: 150, minOffcut_mm: 3000 });
    expect(loose.settings).toEqual({ trim_mm: 0, minOffcut_mm: 0 });
    expect(tight.settings).toEqual({ trim_mm: 150, minOffcut_mm: 3000 });
    for (const p of tight.plans) {
      expect(p.trim_mm).toBe(150);
      for (const b of p.bars) {
        // stock = trim + cuts + kerfs between them + what is left (one more kerf when the rest is kept)
        const used = 150 + b.cuts.reduce((s, x) => s + x.length_mm, 0) + (b.cuts.length - 1) * p.kerf_mm;
        expect(used + b.leftover_mm).toBeLessThanOrEqual(b.stock_mm + 1e-6);
        expect(used + b.leftover_mm).toBeGreaterThanOrEqual(b.stock_mm - p.kerf_mm - 1e-6);
        // nothing shorter than 3000 mm is kept
        if (b.leftoverKept) expect(b.leftover_mm).toBeGreaterThanOrEqual(3000);
      }
    }
    const leftover = (plan: typeof loose) => plan.plans.flatMap((p) => p.bars).reduce((s, b) => s + b.leftover_mm, 0);
    const bars = (plan: typeof loose) => plan.plans.flatMap((p) => p.bars).length;
    // with 150 mm lost off every bar, the same parts leave less over per bar, or need more bars
    expect(leftover(tight) / bars(tight)).toBeLessThan(leftover(loose) / bars(loose) + 1e-9);
    expect(loose.plans.flatMap((p) => p.bars).some((b) => b.leftoverKept)).toBe(true);
  });
});
