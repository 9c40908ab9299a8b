import { describe, expect, it } from 'vitest';
import type { CustomProfileView, ImportResult, Offcut } from '@shared/api/shop';
import { ACTORS, EDITORS, MEMBERS, refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor) => w.clients.get(a)!;

const upload = (a: Actor, path: string, text: string, name = 'stock.csv') => c(a).post(path).attach('file', Buffer.from(text, 'utf8'), { filename: name, contentType: 'text/csv' });

describe('offcuts on the shelf from CSV', () => {
  const csv = ['profile,length,quantity', '30x30-s8,1200,2', '30×30 slot 8,600 mm,1', 'mystery,500,1', '30x30-s8,-40,1', '30x30-s8,2 ft,'].join('\n');

  it.each(ACTORS)('%s: import follows the role', async (a) => {
    if (EDITORS.includes(a)) return;
    expect((await upload(a, `/api/workshops/${w.workshopId}/offcuts/import`, csv)).status).toBe(refusal(a));
  });

  it('keeps the good rows and lists the bad ones with line and reason', async () => {
    const res = await upload('designer', `/api/workshops/${w.workshopId}/offcuts/import`, csv);
    expect(res.status).toBe(200);
    const body = res.body as ImportResult;
    expect(body.imported).toBe(3);
    expect(body.errors.map((e) => e.line)).toEqual([4, 5]);
    expect(body.errors[0].reason).toMatch(/profile: "mystery"/);
    const shelf = (await c('viewer').get(`/api/workshops/${w.workshopId}/offcuts`).expect(200)).body as Offcut[];
    // 2 ft = 609.6 mm (1 ft = 0.3048 m exactly, NIST)
    expect(shelf.map((o) => [o.profile, o.length_mm, o.qty])).toEqual([
      ['30x30-s8', 1200, 2],
      ['30x30-s8', 609.6, 1],
      ['30x30-s8', 600, 1],
    ]);
  });

  it('a missing file or a missing column is a clear error, and nothing is added', async () => {
    const none = await c('owner').post(`/api/workshops/${w.workshopId}/offcuts/import`);
    expect(none.status).toBe(400);
    expect(none.body.error.fields.file).toBeTruthy();
    const res = await upload('owner', `/api/workshops/${w.workshopId}/offcuts/import`, 'profile,qty\n30x30-s8,1\n');
    expect(res.body).toEqual({ imported: 0, errors: [{ line: 1, reason: 'missing column: length' }] });
    expect(((await c('owner').get(`/api/workshops/${w.workshopId}/offcuts`)).body as Offcut[]).length).toBe(3);
  });

  it('the planner uses shelf offcuts when they save buying a bar', async () => {
    // 4 × 2500 mm on the shelf hold more than a 6000 mm bar's worth of parts, so at least one bought bar is saved.
    await upload('owner', `/api/workshops/${w.workshopId}/offcuts/import`, 'profile,length,quantity\n30x30-s8,2500,4\n').expect(200);
    const supplier = (await c('owner').post(`/api/workshops/${w.workshopId}/suppliers`, { name: 'Quay Supply', email: 'q@quay.test', stock: [{ profile: null, length_mm: 6000, price: 40 }] }).expect(201)).body;
    const order = (await c('owner').post(`/api/workshops/${w.workshopId}/orders`, { frameId: w.frameId, supplierId: supplier.id }).expect(201)).body;
    const onHand = order.contents.order.profiles[0].order.stock.lines.filter((l: { onHand: boolean }) => l.onHand);
    expect(onHand.length).toBeGreaterThan(0);
    expect(order.barsToBuy).toBeLessThan(order.contents.order.profiles[0].order.stock.lines.reduce((n: number, l: { qty: number }) => n + l.qty, 0));
    const noShelf = (await c('owner').post(`/api/workshops/${w.workshopId}/orders`, { frameId: w.frameId, supplierId: supplier.id, useShelf: false }).expect(201)).body;
    expect(noShelf.contents.order.profiles[0].order.stock.lines.every((l: { onHand: boolean }) => !l.onHand)).toBe(true);
  });

  it('deletes an offcut by role', async () => {
    const [first] = (await c('owner').get(`/api/workshops/${w.workshopId}/offcuts`)).body as Offcut[];
    expect((await c('cutter').delete(`/api/workshops/${w.workshopId}/offcuts/${first.id}`)).status).toBe(403);
    expect((await c('owner').delete(`/api/workshops/${w.workshopId}/offcuts/${first.id}`)).status).toBe(204);
    expect((await c('owner').delete(`/api/workshops/${w.workshopId}/offcuts/${first.id}`)).status).toBe(404);
  });
});

describe('custom profiles from CSV', () => {
  it('imports good rows, lists bad ones, and updates a name imported again', async () => {
    const csv = ['name,size,area_mm2,Ix_mm4,Iy_mm4,mass_kg_per_m', 'Shop 40 light,40x40,430,68000,68000,1.16', 'Broken,forty,1,1,1,1', 'Shop 40 heavy,40x40,620,90000,90000,1.67'].join('\r\n');
    const res = await upload('owner', `/api/workshops/${w.workshopId}/custom-profiles/import`, csv);
    expect(res.body).toEqual({ imported: 2, errors: [{ line: 3, reason: expect.stringMatching(/^size:/) }] });
    const again = await upload('designer', `/api/workshops/${w.workshopId}/custom-profiles/import`, 'name,size,area_mm2,Ix_mm4,Iy_mm4,mass_kg_per_m\nShop 40 light,40x40,440,69000,69000,1.19\n');
    expect(again.body.imported).toBe(1);
    const list = (await c('viewer').get(`/api/workshops/${w.workshopId}/custom-profiles`).expect(200)).body as CustomProfileView[];
    expect(list.map((p) => [p.name, p.area_mm2])).toEqual([
      ['Shop 40 heavy', 620],
      ['Shop 40 light', 440],
    ]);
    expect((await upload('cutter', `/api/workshops/${w.workshopId}/custom-profiles/import`, csv)).status).toBe(403);
  });

  it('an offcut can name a custom profile', async () => {
    const res = await upload('owner', `/api/workshops/${w.workshopId}/offcuts/import`, 'profile,length,quantity\nshop 40 light,900,1\n');
    expect(res.body).toEqual({ imported: 1, errors: [] });
  });
});

describe('attachments on a project', () => {
  const png = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64, 1)]);
  const pdf = Buffer.from('%PDF-1.4\n% data sheet\n%%EOF\n');
  const path = () => `/api/projects/${w.projectId}/attachments`;
  const attach = (a: Actor, data: Buffer, filename: string, type: string) => c(a).post(path()).attach('file', data, { filename, contentType: type });

  it('owner and designer attach photos and PDFs; others cannot', async () => {
    expect((await attach('designer', png, 'fit-check.png', 'image/png')).status).toBe(201);
    expect((await attach('owner', pdf, 'slide data sheet.pdf', 'application/pdf')).status).toBe(201);
    for (const a of ['cutter', 'viewer', 'outsider', 'anonymous'] as Actor[]) expect((await attach(a, png, 'x.png', 'image/png')).status).toBe(refusal(a));
  });

  it('decides the type from the bytes, not the name', async () => {
    const res = await attach('owner', Buffer.from('<script>alert(1)</script>'), 'photo.png', 'image/png');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.file).toMatch(/JPEG, PNG or WebP/);
  });

  it('refuses files over the size limit with 413', async () => {
    const big = Buffer.concat([pdf, Buffer.alloc(10 * 1024 * 1024 + 1)]);
    const res = await attach('owner', big, 'huge.pdf', 'application/pdf');
    expect(res.status).toBe(413);
  });

  it('serves files to members only', async () => {
    for (const a of ACTORS) {
      const res = await c(a).get(path());
      expect(res.status).toBe(MEMBERS.includes(a) ? 200 : refusal(a));
    }
    const list = (await c('viewer').get(path())).body as { id: string; filename: string; contentType: string }[];
    expect(list.map((x) => x.contentType).sort()).toEqual(['application/pdf', 'image/png']);
    const photo = list.find((x) => x.contentType === 'image/png')!;
    const got = await c('cutter').get(`/api/attachments/${photo.id}`).buffer(true);
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('image/png');
    expect(Buffer.from(got.body as Buffer).equals(png)).toBe(true);
    expect(got.headers['content-security-policy']).toMatch(/sandbox/);
    expect((await c('outsider').get(`/api/attachments/${photo.id}`)).status).toBe(404);
    expect((await c('anonymous').get(`/api/attachments/${photo.id}`)).status).toBe(401);
    expect((await c('viewer').delete(`/api/attachments/${photo.id}`)).status).toBe(403);
    expect((await c('designer').delete(`/api/attachments/${photo.id}`)).status).toBe(204);
  });
});
