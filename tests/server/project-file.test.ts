import { beforeAll, describe, expect, it } from 'vitest';
import { MAX_PROJECT_FILE_BYTES, PROJECT_FILE_FORMAT, projectFileSchema, type ProjectFile } from '@shared/api/project-file';
import type { CuttingState } from '@shared/api/shop';
import { ProjectClient } from '../../server/modules/access/project-client.entity';
import { Project } from '../../server/modules/projects/project.entity';
import { User, type UserEntity } from '../../server/modules/users/user.entity';
import type { ApiClient } from '../support/api-client';
import { signedIn } from '../support/api-client';
import { makeUser, makeWorkshop } from '../support/factories';
import { ACTORS, demoDocument, refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';

// A project exported as one file of our own format and imported into another workshop: the same frames,
// revisions, cutting and files, under new ids, with nothing of the first workshop in it. Only owners and
// designers may do either; a bad or oversized file is refused naming what is wrong, and a refusal stores nothing.

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor): ApiClient => w.clients.get(a)!;

const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(200, 7)]);
let otherWorkshopId: string;
let exported: string;

function binary(res: NodeJS.ReadableStream, cb: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (d: Buffer) => chunks.push(Buffer.from(d)));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}

async function exportOf(actor: Actor, projectId: string) {
  return c(actor).get(`/api/projects/${projectId}/export`).buffer(true).parse(binary as never);
}

function importInto(actor: Actor, workshopId: string, file: Buffer | string, filename = 'project.slotwright.json') {
  return c(actor).post(`/api/workshops/${workshopId}/projects/import`).attach('file', Buffer.isBuffer(file) ? file : Buffer.from(file), { filename, contentType: 'application/json' });
}

/** Every row an import could add, as one comparable value. */
async function stored(): Promise<string> {
  const conn = w.ctx.orm.em.fork().getConnection();
  const tables = ['projects', 'frames', 'frame_revisions', 'cut_sessions', 'cut_ticks', 'attachments'];
  const parts = await Promise.all(tables.map((t) => conn.execute<{ n: string; d: string | null }[]>(`select count(*) as n, md5(coalesce(string_agg(x::text, ',' order by x::text), '')) as d from "${t}" x`)));
  return parts.map((p) => `${p[0].n}:${p[0].d}`).join('|');
}

/** The exported file without the moment it was made, for comparing two exports. */
const content = (text: string) => {
  const { exportedAt: _, ...rest } = JSON.parse(text) as ProjectFile;
  return rest;
};

beforeAll(async () => {
  // The designer and the owner also design for a second workshop; the viewer is only a viewer there.
  const member = (actor: Actor) => ({ id: w.userIds.get(actor)! }) as UserEntity;
  const other = await makeWorkshop(w.ctx.orm, [
    { user: member('designer'), role: 'designer' },
    { user: member('viewer'), role: 'viewer' },
  ]);
  otherWorkshopId = other.id;

  // The project: its frame saved twice, each save ending its editing stretch (two revisions), cutting started with
  // one cut ticked, and a photo.
  const designer = c('designer');
  const frame = (await designer.get(`/api/frames/${w.frameId}`).expect(200)).body as { version: number; document: ReturnType<typeof demoDocument> };
  const doc = structuredClone(frame.document) as { members: { name?: string }[] };
  for (const name of ['left upright', 'left upright, front']) {
    doc.members[0].name = name;
    const v = (await designer.get(`/api/frames/${w.frameId}`).expect(200)).body.version as number;
    await designer.post(`/api/frames/${w.frameId}/revisions`, { baseVersion: v }).expect(200);
    await designer.put(`/api/frames/${w.frameId}/document`, { baseVersion: v, document: doc }).expect(200);
  }
  const cutting = (await c('cutter').post(`/api/frames/${w.frameId}/cutting`, {}).expect(201)).body as CuttingState;
  const p = cutting.session!.plan.plans[0];
  await c('cutter').post(`/api/frames/${w.frameId}/cutting/ticks`, { cutKey: `${p.profileId}/0/0` }).expect(200);
  const photo = await designer.post(`/api/projects/${w.projectId}/attachments`).attach('file', PNG, { filename: 'finish.png', contentType: 'image/png' }).expect(201);
  await designer.patch(`/api/attachments/${photo.body.id}`, { sharedWithClient: true }).expect(200);
}, 60_000);

describe('exporting a project', () => {
  it('gives one versioned file with the frames, revisions, cutting and files, and nothing naming the workshop or its people', async () => {
    const res = await exportOf('designer', w.projectId);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename=".*\.slotwright\.json"/);
    exported = (res.body as Buffer).toString('utf8');
    const file = projectFileSchema.parse(JSON.parse(exported));
    expect(file).toMatchObject({ format: PROJECT_FILE_FORMAT, version: 1, project: { name: 'Rear kitchen pod' } });
    expect(file.frames).toHaveLength(1);
    expect(file.frames[0]).toMatchObject({ name: 'Kitchen pod v1', version: 3 });
    expect(file.frames[0].revisions.map((r) => r.version)).toEqual([1, 2]);
    expect(file.frames[0].cutting).toHaveLength(1);
    expect(file.frames[0].cutting[0].ticks).toHaveLength(1);
    expect(Buffer.from(file.attachments[0].data, 'base64').equals(PNG)).toBe(true);
    for (const id of [w.workshopId, w.projectId, w.frameId, ...w.userIds.values()]) expect(exported).not.toContain(id);
    expect(exported).not.toContain('Harbour Lane');
  });
});

describe('importing it', () => {
  it('into another workshop: a new project with new ids and the same content; exporting it again gives the same file', async () => {
    const before = (await c('designer').get(`/api/workshops/${otherWorkshopId}/projects`).expect(200)).body as unknown[];
    const res = await importInto('designer', otherWorkshopId, exported);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const id = res.body.id as string;
    expect(id).not.toBe(w.projectId);
    expect(res.body).toMatchObject({ name: 'Rear kitchen pod', frameCount: 1 });
    expect((await c('designer').get(`/api/workshops/${otherWorkshopId}/projects`).expect(200)).body).toHaveLength(before.length + 1);

    const detail = (await c('designer').get(`/api/projects/${id}`).expect(200)).body as { workshopId: string; frames: { id: string; version: number }[] };
    expect(detail.workshopId).toBe(otherWorkshopId);
    const frameId = detail.frames[0].id;
    expect(frameId).not.toBe(w.frameId);
    expect((await c('designer').get(`/api/frames/${frameId}/revisions`).expect(200)).body).toHaveLength(3);
    const cutting = (await c('designer').get(`/api/frames/${frameId}/cutting`).expect(200)).body as CuttingState;
    expect(cutting.session?.frameVersion).toBe(3);
    expect(cutting.ticks).toHaveLength(1);
    const files = (await c('designer').get(`/api/projects/${id}/attachments`).expect(200)).body as { id: string; sharedWithClient: boolean }[];
    expect(files).toHaveLength(1);
    expect(files[0].sharedWithClient).toBe(true);
    const bytes = await c('designer').get(`/api/attachments/${files[0].id}`).buffer(true).parse(binary as never).expect(200);
    expect((bytes.body as Buffer).equals(PNG)).toBe(true);

    // The round trip: the imported project exports to the same file, so nothing was lost or changed on the way.
    const again = await exportOf('designer', id);
    expect(content((again.body as Buffer).toString('utf8'))).toEqual(content(exported));
    // The first workshop's members see nothing of the copy; the cutter of the first workshop is no member here.
    expect((await c('cutter').get(`/api/projects/${id}`)).status).toBe(404);
  });

  it('back into the same workshop, as a second project beside the first', async () => {
    const res = await importInto('owner', w.workshopId, exported);
    expect(res.status).toBe(201);
    expect(res.body.id).not.toBe(w.projectId);
  });
});

describe('who may export and import', () => {
  it.each(ACTORS)('%s', async (actor) => {
    const may = actor === 'owner' || actor === 'designer';
    expect((await exportOf(actor, w.projectId)).status).toBe(may ? 200 : refusal(actor));
    const before = await stored();
    const res = await importInto(actor, w.workshopId, exported);
    expect(res.status).toBe(may ? 201 : refusal(actor));
    if (!may) {
      expect(res.body.error.code).toBeTruthy();
      expect(await stored()).toBe(before);
    }
  });

  it('a viewer of the other workshop cannot import into it; a client of the project cannot export it', async () => {
    const before = await stored();
    expect((await importInto('viewer', otherWorkshopId, exported)).status).toBe(403);
    expect(await stored()).toBe(before);
    const user = await makeUser(w.ctx.orm, { name: 'Client of the pod' });
    const em = w.ctx.orm.em.fork();
    em.create(ProjectClient, { project: em.getReference(Project, w.projectId), user: em.getReference(User, user.id) });
    await em.flush();
    const client = await signedIn(w.ctx.app, user);
    expect((await client.get(`/api/projects/${w.projectId}/export`)).status).toBe(404);
  });
});

describe('a file that is wrong', () => {
  const mutate = (change: (f: Record<string, any>) => void): string => {
    const f = JSON.parse(exported) as Record<string, any>;
    change(f);
    return JSON.stringify(f);
  };
  const cases: [string, () => string | Buffer, string][] = [
    ['not JSON', () => 'frames: none', 'file'],
    ['another kind of file', () => JSON.stringify({ format: 'something-else', version: 1 }), 'format'],
    ['a later version', () => mutate((f) => (f.version = 2)), 'version'],
    ['a key this version does not know', () => mutate((f) => (f.frames[0].colour = 'red')), 'frames.0'],
    ['a frame name too long', () => mutate((f) => (f.frames[0].name = 'x'.repeat(500))), 'frames.0.name'],
    ['a member 1 km long in a revision', () => mutate((f) => (f.frames[0].revisions[1].document.members[0].length_mm = 1e6)), 'frames.0.revisions.1.document.members[0].length_mm'],
    ['a revision not older than the frame', () => mutate((f) => (f.frames[0].revisions[0].version = 3)), 'frames.0.revisions.0.version'],
    ['a tick of a cut the plan does not have', () => mutate((f) => (f.frames[0].cutting[0].ticks[0].cutKey = 'nope/9/9')), 'frames.0.cutting.0.ticks.0.cutKey'],
    ['a file whose bytes are not what it says', () => mutate((f) => (f.attachments[0].data = Buffer.from('plain text').toString('base64'))), 'attachments.0.data'],
    ['a NUL in the project name', () => mutate((f) => (f.project.name = 'pod\u0000')), 'project.name'],
  ];

  it.each(cases)('%s: 400 naming the field, nothing stored', async (_name, file, field) => {
    const before = await stored();
    const res = await importInto('designer', otherWorkshopId, file());
    expect(res.status, JSON.stringify(res.body)).toBe(400);
    expect(Object.keys(res.body.error.fields ?? {}), JSON.stringify(res.body.error.fields)).toContain(field);
    expect(await stored()).toBe(before);
  });

  it('larger than the bound: 413 naming the file, nothing stored', async () => {
    const before = await stored();
    const res = await importInto('designer', otherWorkshopId, Buffer.alloc(MAX_PROJECT_FILE_BYTES + 1, 0x20));
    expect(res.status).toBe(413);
    expect(res.body.error.fields).toHaveProperty('file');
    expect(await stored()).toBe(before);
  });

  it('no file at all: 400 naming the file', async () => {
    const res = await c('designer').post(`/api/workshops/${otherWorkshopId}/projects/import`).field('note', 'x');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('file');
  });
});
