import { beforeAll, describe, expect, it } from 'vitest';
import { apiRoutes } from '../support/route-list';
import { ApiClient, signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser } from '../support/factories';
import { pdfText } from '../support/pdf-text';
import { ProjectClient } from '../../server/modules/access/project-client.entity';
import { Project } from '../../server/modules/projects/project.entity';
import { User } from '../../server/modules/users/user.entity';
import { Workshop } from '../../server/modules/workshops/workshop.entity';
import { demoDocument, useShopWorld, type ShopWorld } from './shop-world';

// A client is let into one project of the workshop. On every route of the API they reach exactly that
// project's design and the files shared with them; everything else (other projects, other clients, the
// shop's suppliers, prices, orders, stock, members, mail) answers 404 as if it did not exist.

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});

const SUPPLIER = { name: 'Quayside Alloys', email: 'sales@quayside.test', currency: 'EUR', stock: [{ profile: null, length_mm: 6000, price: 47.5 }], cutFee: 1.35 };

interface Ids {
  W: string;
  A: string;
  FA: string;
  B: string;
  FB: string;
  supplier: string;
  order: string;
  shared: string;
  unshared: string;
  offcut: string;
  otherClient: string;
  invitation: string;
  shareLink: string;
  me: string;
}
let ids: Ids;
let client: ApiClient;
let otherClient: ApiClient;

async function letIn(userId: string, projectId: string): Promise<void> {
  const em = w.ctx.orm.em.fork();
  em.create(ProjectClient, { project: em.getReference(Project, projectId), user: em.getReference(User, userId) });
  await em.flush();
}

const PNG_BYTES = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64, 1)]);

async function upload(projectId: string, name: string): Promise<string> {
  const owner = w.clients.get('owner')!;
  const res = await owner.post(`/api/projects/${projectId}/attachments`).attach('file', PNG_BYTES, { filename: name, contentType: 'image/png' });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.id as string;
}

beforeAll(async () => {
  const owner = w.clients.get('owner')!;
  const em = w.ctx.orm.em.fork();
  const workshop = await em.findOneOrFail(Workshop, { id: w.workshopId });
  const projectB = await makeProject(w.ctx.orm, workshop, { name: 'Bed frame for another client' });
  const frameB = await makeFrame(w.ctx.orm, projectB, { name: 'Bed frame v1', document: demoDocument() });
  const me = await makeUser(w.ctx.orm, { name: 'Client of A' });
  const other = await makeUser(w.ctx.orm, { name: 'Client of B' });
  await letIn(me.id, w.projectId);
  await letIn(other.id, projectB.id);
  client = await signedIn(w.ctx.app, me);
  otherClient = await signedIn(w.ctx.app, other);

  const supplier = (await owner.post(`/api/workshops/${w.workshopId}/suppliers`, SUPPLIER).expect(201)).body.id as string;
  const order = (await owner.post(`/api/workshops/${w.workshopId}/orders`, { frameId: w.frameId, supplierId: supplier, mode: 'stock' }).expect(201)).body.id as string;
  const shared = await upload(w.projectId, 'finish-sample.png');
  const unshared = await upload(w.projectId, 'supplier-quote.png');
  await owner.patch(`/api/attachments/${shared}`, { sharedWithClient: true }).expect(200);
  const offcutCsv = Buffer.from('profile,length_mm,qty\n40x40-s8,900,2\n');
  await owner.post(`/api/workshops/${w.workshopId}/offcuts/import`).attach('file', offcutCsv, { filename: 'offcuts.csv', contentType: 'text/csv' });
  const offcut = ((await owner.get(`/api/workshops/${w.workshopId}/offcuts`).expect(200)).body as { id: string }[])[0].id;
  const invitation = (await owner.post(`/api/workshops/${w.workshopId}/invitations`, { email: 'someone@new.test', role: 'designer' }).expect(201)).body.id as string;
  const shareLink = (await owner.post(`/api/projects/${w.projectId}/share-links`, { days: 7 }).expect(201)).body.id as string;
  ids = { W: w.workshopId, A: w.projectId, FA: w.frameId, B: projectB.id, FB: frameB.id, supplier, order, shared, unshared, offcut, otherClient: other.id, invitation, shareLink, me: me.id };
}, 60_000);

type Call = [method: 'get' | 'post' | 'put' | 'patch' | 'delete', path: (i: Ids) => string, body?: unknown];

// What the client of project A may read, with the route each call exercises.
const ALLOWED: Record<string, Call> = {
  'GET /api/auth/me': ['get', () => '/api/auth/me'],
  'GET /api/auth/csrf': ['get', () => '/api/auth/csrf'],
  'GET /api/workshops': ['get', () => '/api/workshops'],
  'GET /api/projects/:projectId': ['get', (i) => `/api/projects/${i.A}`],
  'GET /api/projects/:projectId/frames': ['get', (i) => `/api/projects/${i.A}/frames`],
  'GET /api/frames/:frameId': ['get', (i) => `/api/frames/${i.FA}`],
  'GET /api/frames/:frameId/revisions': ['get', (i) => `/api/frames/${i.FA}/revisions`],
  'GET /api/frames/:frameId/revisions/:version': ['get', (i) => `/api/frames/${i.FA}/revisions/1`],
  'GET /api/frames/:frameId/revisions/compare': ['get', (i) => `/api/frames/${i.FA}/revisions/compare?from=1&to=1`],
  'GET /api/projects/:projectId/attachments': ['get', (i) => `/api/projects/${i.A}/attachments`],
  'GET /api/attachments/:attachmentId': ['get', (i) => `/api/attachments/${i.shared}`],
};

// Everything else, each called the way that would touch project A's workshop if it were let through.
const REFUSED: Record<string, Call[]> = {
  'GET /api/projects/:projectId': [['get', (i) => `/api/projects/${i.B}`]],
  'GET /api/projects/:projectId/frames': [['get', (i) => `/api/projects/${i.B}/frames`]],
  'GET /api/frames/:frameId': [['get', (i) => `/api/frames/${i.FB}`]],
  'GET /api/frames/:frameId/revisions': [['get', (i) => `/api/frames/${i.FB}/revisions`]],
  'GET /api/frames/:frameId/revisions/:version': [['get', (i) => `/api/frames/${i.FB}/revisions/1`]],
  'GET /api/frames/:frameId/revisions/compare': [['get', (i) => `/api/frames/${i.FB}/revisions/compare?from=1&to=1`]],
  // A client reads the history of a frame they can see and never writes to it.
  'POST /api/frames/:frameId/revisions': [['post', (i) => `/api/frames/${i.FA}/revisions`, { baseVersion: 1, name: 'mine' }]],
  'PATCH /api/frames/:frameId/revisions/:version': [['patch', (i) => `/api/frames/${i.FA}/revisions/1`, { name: 'mine' }]],
  'POST /api/frames/:frameId/revisions/:version/restore': [['post', (i) => `/api/frames/${i.FA}/revisions/1/restore`, { baseVersion: 1 }]],
  'GET /api/projects/:projectId/attachments': [['get', (i) => `/api/projects/${i.B}/attachments`]],
  'GET /api/attachments/:attachmentId': [['get', (i) => `/api/attachments/${i.unshared}`]],
  'PATCH /api/workshops/:workshopId': [['patch', (i) => `/api/workshops/${i.W}`, { name: 'Mine now' }]],
  'GET /api/workshops/:workshopId/members': [['get', (i) => `/api/workshops/${i.W}/members`]],
  // A client is no member: the workshop's settings (its stock prices among them) are not theirs to read or change.
  'GET /api/workshops/:workshopId/settings': [['get', (i) => `/api/workshops/${i.W}/settings`]],
  'PUT /api/workshops/:workshopId/settings': [['put', (i) => `/api/workshops/${i.W}/settings`, {}]],
  'POST /api/workshops/:workshopId/members': [['post', (i) => `/api/workshops/${i.W}/members`, { email: 'x@y.test', role: 'owner' }]],
  'PATCH /api/workshops/:workshopId/members/:userId': [['patch', (i) => `/api/workshops/${i.W}/members/${i.me}`, { role: 'owner' }]],
  'DELETE /api/workshops/:workshopId/members/:userId': [['delete', (i) => `/api/workshops/${i.W}/members/${i.me}`]],
  'GET /api/workshops/:workshopId/projects': [['get', (i) => `/api/workshops/${i.W}/projects`]],
  'POST /api/workshops/:workshopId/projects': [['post', (i) => `/api/workshops/${i.W}/projects`, { name: 'Sneaky' }]],
  'PATCH /api/projects/:projectId': [['patch', (i) => `/api/projects/${i.A}`, { name: 'Renamed by the client' }]],
  'DELETE /api/projects/:projectId': [['delete', (i) => `/api/projects/${i.A}`]],
  'POST /api/projects/:projectId/frames': [['post', (i) => `/api/projects/${i.A}/frames`, { name: 'Extra' }]],
  'PATCH /api/frames/:frameId': [['patch', (i) => `/api/frames/${i.FA}`, { name: 'Renamed' }]],
  'PUT /api/frames/:frameId/document': [['put', (i) => `/api/frames/${i.FA}/document`, { baseVersion: 1, document: demoDocument() }]],
  'DELETE /api/frames/:frameId': [['delete', (i) => `/api/frames/${i.FA}`]],
  'POST /api/frames/:frameId/restore': [['post', (i) => `/api/frames/${i.FA}/restore`]],
  'GET /api/workshops/:workshopId/suppliers': [['get', (i) => `/api/workshops/${i.W}/suppliers`]],
  'POST /api/workshops/:workshopId/suppliers': [['post', (i) => `/api/workshops/${i.W}/suppliers`, SUPPLIER]],
  'PATCH /api/suppliers/:supplierId': [['patch', (i) => `/api/suppliers/${i.supplier}`, { cutFee: 0 }]],
  'DELETE /api/suppliers/:supplierId': [['delete', (i) => `/api/suppliers/${i.supplier}`]],
  'GET /api/workshops/:workshopId/orders': [['get', (i) => `/api/workshops/${i.W}/orders`]],
  'POST /api/workshops/:workshopId/orders': [['post', (i) => `/api/workshops/${i.W}/orders`, (i: Ids) => ({ frameId: i.FA, supplierId: i.supplier })]],
  'GET /api/orders/:orderId': [['get', (i) => `/api/orders/${i.order}`]],
  'GET /api/orders/:orderId/order.pdf': [['get', (i) => `/api/orders/${i.order}/order.pdf`]],
  'GET /api/orders/:orderId/order.csv': [['get', (i) => `/api/orders/${i.order}/order.csv`]],
  'POST /api/orders/:orderId/send': [['post', (i) => `/api/orders/${i.order}/send`]],
  'GET /api/orders/:orderId/send-preview': [['get', (i) => `/api/orders/${i.order}/send-preview`]],
  'PATCH /api/orders/:orderId': [['patch', (i) => `/api/orders/${i.order}`, { status: 'received' }]],
  'DELETE /api/orders/:orderId': [['delete', (i) => `/api/orders/${i.order}`]],
  'GET /api/frames/:frameId/cutting': [['get', (i) => `/api/frames/${i.FA}/cutting`]],
  'POST /api/frames/:frameId/cutting': [['post', (i) => `/api/frames/${i.FA}/cutting`, {}]],
  'POST /api/frames/:frameId/cutting/ticks': [['post', (i) => `/api/frames/${i.FA}/cutting/ticks`, { cutKey: 'x' }]],
  'DELETE /api/frames/:frameId/cutting/ticks': [['delete', (i) => `/api/frames/${i.FA}/cutting/ticks?cutKey=x`]],
  'GET /api/frames/:frameId/shop/:doc': ['saw-list.pdf', 'drill-list.pdf', 'pick-list.pdf', 'labels.pdf', 'cut-list.csv', 'order-list.csv'].map(
    (d): Call => ['get', (i) => `/api/frames/${i.FA}/shop/${d}`],
  ),
  'GET /api/workshops/:workshopId/offcuts': [['get', (i) => `/api/workshops/${i.W}/offcuts`]],
  'POST /api/workshops/:workshopId/offcuts/import': [['post', (i) => `/api/workshops/${i.W}/offcuts/import`]],
  'DELETE /api/workshops/:workshopId/offcuts/:offcutId': [['delete', (i) => `/api/workshops/${i.W}/offcuts/${i.offcut}`]],
  'GET /api/workshops/:workshopId/custom-profiles': [['get', (i) => `/api/workshops/${i.W}/custom-profiles`]],
  'POST /api/workshops/:workshopId/custom-profiles/import': [['post', (i) => `/api/workshops/${i.W}/custom-profiles/import`]],
  'POST /api/projects/:projectId/attachments': [['post', (i) => `/api/projects/${i.A}/attachments`]],
  'PATCH /api/attachments/:attachmentId': [['patch', (i) => `/api/attachments/${i.unshared}`, { sharedWithClient: true }]],
  'DELETE /api/attachments/:attachmentId': [['delete', (i) => `/api/attachments/${i.shared}`]],
  'GET /api/workshops/:workshopId/outbox': [['get', (i) => `/api/workshops/${i.W}/outbox`]],
  'GET /api/workshops/:workshopId/outbox/:mailId/attachments/:index': [['get', (i) => `/api/workshops/${i.W}/outbox/abc-0123abcd/attachments/0`]],
  'GET /api/workshops/:workshopId/invitations': [['get', (i) => `/api/workshops/${i.W}/invitations`]],
  'POST /api/workshops/:workshopId/invitations': [['post', (i) => `/api/workshops/${i.W}/invitations`, (i: Ids) => ({ email: 'friend@new.test', role: 'client', projectIds: [i.B] })]],
  'DELETE /api/invitations/:invitationId': [['delete', (i) => `/api/invitations/${i.invitation}`]],
  'GET /api/projects/:projectId/clients': [['get', (i) => `/api/projects/${i.A}/clients`], ['get', (i) => `/api/projects/${i.B}/clients`]],
  'DELETE /api/projects/:projectId/clients/:userId': [['delete', (i) => `/api/projects/${i.B}/clients/${i.otherClient}`]],
  'GET /api/projects/:projectId/share-links': [['get', (i) => `/api/projects/${i.A}/share-links`]],
  'POST /api/projects/:projectId/share-links': [['post', (i) => `/api/projects/${i.A}/share-links`, { days: 30 }]],
  'DELETE /api/share-links/:shareLinkId': [['delete', (i) => `/api/share-links/${i.shareLink}`]],
  'GET /api/projects/:projectId/activity': [['get', (i) => `/api/projects/${i.A}/activity`]],
  'GET /api/projects/:projectId/export': [['get', (i) => `/api/projects/${i.A}/export`]],
  'POST /api/workshops/:workshopId/projects/import': [['post', (i) => `/api/workshops/${i.W}/projects/import`]],
  'GET /api/workshops/:workshopId/bin': [['get', (i) => `/api/workshops/${i.W}/bin`]],
  'POST /api/projects/:projectId/restore': [['post', (i) => `/api/projects/${i.A}/restore`], ['post', (i) => `/api/projects/${i.B}/restore`]],
};

// Routes that do not depend on the caller's workshop (signing in and out, tokens from e-mails, the planner,
// health): their own tests cover them.
const NOT_WORKSHOP_DATA = new Set([
  'GET /api/health',
  'POST /api/auth/signup',
  'POST /api/auth/signin',
  'POST /api/auth/signout',
  'POST /api/auth/password',
  'POST /api/auth/password-reset',
  'POST /api/auth/password-reset/confirm',
  'POST /api/workshops',
  'POST /api/plan/cut',
  'GET /api/invitations/:token',
  'POST /api/invitations/:token/accept',
  'GET /api/shared/:token',
  'GET /api/shared/:token/attachments/:attachmentId',
]);

describe('a client of one project', () => {
  it('has every API route classified by this test (a new route must say what a client gets)', () => {
    const covered = new Set([...Object.keys(ALLOWED), ...Object.keys(REFUSED), ...NOT_WORKSHOP_DATA]);
    expect(apiRoutes(w.ctx.app).filter((r) => !covered.has(r))).toEqual([]);
  });

  it.each(Object.entries(ALLOWED))('reads %s, with no supplier, price or other client in it', async (_name, [method, path, body]) => {
    const res = await client.send(method, path(ids), bodyOf(body));
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const text = res.type.startsWith('application/json') ? JSON.stringify(res.body) : '';
    for (const secret of ['Quayside', 'sales@quayside.test', 'Bed frame', 'Client of B', 'price', 'cost', 'supplier-quote', 'notes":"P']) {
      expect(text).not.toContain(secret);
    }
  });

  it.each(Object.entries(REFUSED))('gets 404 from %s and changes nothing', async (_name, calls) => {
    const before = await snapshot();
    for (const [method, path, body] of calls) {
      const res = await client.send(method, path(ids), bodyOf(body));
      expect(res.status, `${method} ${path(ids)}: ${JSON.stringify(res.body)}`).toBe(404);
      expect(res.body.error.code).toBe('not_found');
      expect(JSON.stringify(res.body)).not.toContain('Quayside');
    }
    expect(await snapshot()).toEqual(before);
  });

  it('sees its own project, its frames and only the files shared with it', async () => {
    const me = (await client.get('/api/auth/me').expect(200)).body;
    expect(me.memberships).toEqual([]);
    expect(me.clientProjects).toEqual([{ project: { id: ids.A, name: 'Rear kitchen pod' }, workshop: { id: ids.W, name: 'Harbour Lane Van Works' } }]);
    expect((await client.get('/api/workshops').expect(200)).body).toEqual([]);
    const detail = (await client.get(`/api/projects/${ids.A}`).expect(200)).body;
    expect(detail.role).toBe('client');
    expect(detail.notes).toBe('');
    expect(detail.frames.map((f: { id: string }) => f.id)).toEqual([ids.FA]);
    const files = (await client.get(`/api/projects/${ids.A}/attachments`).expect(200)).body as { id: string }[];
    expect(files.map((f) => f.id)).toEqual([ids.shared]);
    expect((await client.get(`/api/projects/${ids.A}/frames?deleted=true`).expect(200)).body).toEqual([]);
  });

  it('is no client of the other project, and that project’s client is none of this one', async () => {
    expect((await otherClient.get(`/api/projects/${ids.A}`)).status).toBe(404);
    expect((await otherClient.get(`/api/frames/${ids.FA}`)).status).toBe(404);
    expect((await otherClient.get(`/api/projects/${ids.B}`)).status).toBe(200);
  });

  it('loses the project once an owner removes them', async () => {
    const owner = w.clients.get('owner')!;
    const list = (await owner.get(`/api/projects/${ids.B}/clients`).expect(200)).body as { user: { id: string } }[];
    expect(list.map((c) => c.user.id)).toEqual([ids.otherClient]);
    expect((await w.clients.get('designer')!.delete(`/api/projects/${ids.B}/clients/${ids.otherClient}`)).status).toBe(403);
    await owner.delete(`/api/projects/${ids.B}/clients/${ids.otherClient}`).expect(204);
    expect((await otherClient.get(`/api/projects/${ids.B}`)).status).toBe(404);
  });

  it('members still get the shop documents, with the prices and suppliers they are for', async () => {
    const viewer = w.clients.get('viewer')!;
    const pdf = await viewer.get(`/api/frames/${ids.FA}/shop/saw-list.pdf`).buffer(true).parse(binary as never).expect(200);
    expect((await pdfText(pdf.body as Buffer)).text.length).toBeGreaterThan(50);
    expect((await viewer.get(`/api/workshops/${ids.W}/suppliers`).expect(200)).body[0].name).toBe('Quayside Alloys');
  });
});

const bodyOf = (b: unknown): unknown => (typeof b === 'function' ? (b as (i: Ids) => unknown)(ids) : b);

function binary(res: NodeJS.ReadableStream & { setEncoding(e: string): void }, cb: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(Buffer.from(c)));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}

async function snapshot(): Promise<unknown> {
  const conn = w.ctx.orm.em.fork().getConnection();
  const q = async (sql: string) => JSON.stringify(await conn.execute(sql));
  return {
    workshops: await q('select id, name from workshops order by id'),
    members: await q('select workshop_id, user_id, role from memberships order by id'),
    projects: await q('select id, name, notes, deleted_at from projects order by id'),
    frames: await q('select id, name, version, deleted_at, head_name, head_kept from frames order by id'),
    revisions: await q('select frame_id, version, name from frame_revisions order by id'),
    suppliers: await q('select id, name, cut_fee, deleted_at from suppliers order by id'),
    orders: await q('select id, status from orders order by id'),
    offcuts: await q('select id from stock_offcuts order by id'),
    attachments: await q('select id, shared_with_client from attachments order by id'),
    clients: await q('select project_id, user_id from project_clients order by id'),
    invitations: await q('select id, revoked_at from invitations order by id'),
    links: await q('select id, revoked_at from share_links order by id'),
    cuts: await q('select id from cut_sessions order by id'),
  };
}
