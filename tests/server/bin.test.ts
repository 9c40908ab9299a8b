import { describe, expect, it } from 'vitest';
import { BIN_DAYS, binEntrySchema } from '@shared/api/bin';
import { ProjectClient } from '../../server/modules/access/project-client.entity';
import { scheduleBinPurge } from '../../server/modules/bin/bin.routes';
import { Project } from '../../server/modules/projects/project.entity';
import { User } from '../../server/modules/users/user.entity';
import { Workshop } from '../../server/modules/workshops/workshop.entity';
import { signedIn, type ApiClient } from '../support/api-client';
import { makeFrame, makeProject, makeUser, sampleDocument } from '../support/factories';
import { ACTORS, refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';

// Deleting a project or a frame puts it in the workshop's bin for 30 days: gone from every other route, listed
// in the bin for owners and designers, restorable with everything it held, and purged for good after that.

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor): ApiClient => w.clients.get(a)!;
const DAY = 24 * 60 * 60 * 1000;

async function freshProject(name: string) {
  const em = w.ctx.orm.em.fork();
  const workshop = await em.findOneOrFail(Workshop, { id: w.workshopId });
  const project = await makeProject(w.ctx.orm, workshop, { name });
  const frame = await makeFrame(w.ctx.orm, project, { name: `${name} frame`, document: sampleDocument(2, 'b1') });
  return { project, frame };
}

async function bin(): Promise<ReturnType<typeof binEntrySchema.parse>[]> {
  return binEntrySchema.array().parse((await c('designer').get(`/api/workshops/${w.workshopId}/bin`).expect(200)).body);
}

async function ageDeletion(table: 'projects' | 'frames', id: string, days: number): Promise<void> {
  await w.ctx.orm.em.fork().getConnection().execute(`update ${table} set deleted_at = now() - make_interval(days => ?) where id = ?`, [days, id]);
}

async function rowCount(sql: string, params: unknown[]): Promise<number> {
  const rows = await w.ctx.orm.em.fork().getConnection().execute<{ n: string }[]>(sql, params);
  return Number(rows[0].n);
}

describe('a deleted project', () => {
  it('is gone from every route, listed in the bin with its frames, and comes back whole when restored', async () => {
    const { project, frame } = await freshProject('Bench for the yard');
    const designer = c('designer');
    // A revision, so restoring shows the history came back too.
    await designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: sampleDocument(3, 'b2') }).expect(200);
    await c('owner').delete(`/api/projects/${project.id}`).expect(204);

    const listed = (await designer.get(`/api/workshops/${w.workshopId}/projects`).expect(200)).body as { id: string }[];
    expect(listed.map((p) => p.id)).not.toContain(project.id);
    for (const path of [`/api/projects/${project.id}`, `/api/projects/${project.id}/frames`, `/api/frames/${frame.id}`, `/api/frames/${frame.id}/revisions`, `/api/frames/${frame.id}/shop/cut-list.csv`, `/api/frames/${frame.id}/cutting`]) {
      expect((await designer.get(path)).status, path).toBe(404);
    }

    const entry = (await bin()).find((e) => e.id === project.id);
    expect(entry).toMatchObject({ kind: 'project', name: 'Bench for the yard', frameCount: 1, deletedBy: { id: w.userIds.get('owner'), name: 'owner' } });
    expect(Date.parse(entry!.purgeAt) - Date.parse(entry!.deletedAt)).toBe(BIN_DAYS * DAY);

    await designer.post(`/api/projects/${project.id}/restore`).expect(200);
    expect((await bin()).find((e) => e.id === project.id)).toBeUndefined();
    const detail = (await designer.get(`/api/projects/${project.id}`).expect(200)).body as { frames: { id: string; version: number }[] };
    expect(detail.frames).toEqual([expect.objectContaining({ id: frame.id, version: 2 })]);
    expect((await designer.get(`/api/frames/${frame.id}/revisions`).expect(200)).body).toHaveLength(2);
  });
});

describe('a deleted frame', () => {
  it('leaves the project, waits in the bin, and is restored with its document', async () => {
    const { project, frame } = await freshProject('Bed base');
    const designer = c('designer');
    await designer.delete(`/api/frames/${frame.id}`).expect(204);
    const detail = (await designer.get(`/api/projects/${project.id}`).expect(200)).body as { frames: unknown[] };
    expect(detail.frames).toEqual([]);
    expect((await designer.get(`/api/frames/${frame.id}`)).status).toBe(404);
    expect((await bin()).find((e) => e.id === frame.id)).toMatchObject({ kind: 'frame', projectId: project.id, projectName: 'Bed base' });

    await designer.post(`/api/frames/${frame.id}/restore`).expect(200);
    const back = (await designer.get(`/api/frames/${frame.id}`).expect(200)).body as { document: unknown; deletedAt: string | null };
    expect(back.deletedAt).toBeNull();
    expect(back.document).toEqual(sampleDocument(2, 'b1'));
  });
});

describe('after 30 days', () => {
  it('is purged: out of the bin, its rows and revisions deleted, no longer restorable; 29 days is still kept', async () => {
    const old = await freshProject('Old galley');
    const oldFrame = await freshProject('Old drawer stack');
    const recent = await freshProject('Recent shelf');
    const owner = c('owner');
    await owner.put(`/api/frames/${oldFrame.frame.id}/document`, { baseVersion: 1, document: sampleDocument(3, 'b3') }).expect(200);
    await owner.delete(`/api/projects/${old.project.id}`).expect(204);
    await owner.delete(`/api/frames/${oldFrame.frame.id}`).expect(204);
    await owner.delete(`/api/frames/${recent.frame.id}`).expect(204);
    await ageDeletion('projects', old.project.id, BIN_DAYS + 1);
    await ageDeletion('frames', oldFrame.frame.id, BIN_DAYS + 1);
    await ageDeletion('frames', recent.frame.id, BIN_DAYS - 1);

    // Past its days, nothing restores it, even before any purge has run.
    expect((await owner.post(`/api/frames/${oldFrame.frame.id}/restore`)).status).toBe(404);

    const ids = (await bin()).map((e) => e.id);
    expect(ids).not.toContain(old.project.id);
    expect(ids).not.toContain(oldFrame.frame.id);
    expect(ids).toContain(recent.frame.id);
    expect(await rowCount('select count(*) as n from projects where id = ?', [old.project.id])).toBe(0);
    expect(await rowCount('select count(*) as n from frames where project_id = ?', [old.project.id])).toBe(0);
    expect(await rowCount('select count(*) as n from frames where id = ?', [oldFrame.frame.id])).toBe(0);
    expect(await rowCount('select count(*) as n from frame_revisions where frame_id = ?', [oldFrame.frame.id])).toBe(0);
    expect(await rowCount('select count(*) as n from frames where id = ?', [recent.frame.id])).toBe(1);
    expect((await owner.post(`/api/projects/${old.project.id}/restore`)).status).toBe(404);
  });

  it('the server’s timer purges a bin nobody opens', async () => {
    const { frame } = await freshProject('Forgotten bench');
    await c('owner').delete(`/api/frames/${frame.id}`).expect(204);
    await ageDeletion('frames', frame.id, BIN_DAYS + 2);
    const errors: unknown[] = [];
    const stop = scheduleBinPurge(w.ctx.orm, 60_000, (err) => errors.push(err));
    try {
      for (let i = 0; i < 50 && (await rowCount('select count(*) as n from frames where id = ?', [frame.id])) > 0; i++) await new Promise((r) => setTimeout(r, 50));
    } finally {
      stop();
    }
    expect(await rowCount('select count(*) as n from frames where id = ?', [frame.id])).toBe(0);
    expect(errors).toEqual([]);
  });
});

describe('who sees the bin', () => {
  it.each(ACTORS)('%s: the list and restoring are for owners and designers only; a refusal changes nothing', async (actor) => {
    const { project, frame } = await freshProject(`Binned by ${actor}`);
    await c('owner').delete(`/api/frames/${frame.id}`).expect(204);
    await c('owner').delete(`/api/projects/${project.id}`).expect(204);
    const may = actor === 'owner' || actor === 'designer';
    const expected = may ? 200 : refusal(actor);
    expect((await c(actor).get(`/api/workshops/${w.workshopId}/bin`)).status).toBe(expected);
    const before = await rowCount('select count(*) as n from projects where deleted_at is null', []);
    expect((await c(actor).post(`/api/projects/${project.id}/restore`)).status).toBe(expected);
    expect(await rowCount('select count(*) as n from projects where deleted_at is null', [])).toBe(before + (may ? 1 : 0));
  });

  it('a client of the project never sees it: the bin, the restores and the deleted list answer as if nothing were there', async () => {
    const { project, frame } = await freshProject('Client’s wardrobe');
    const other = await makeFrame(w.ctx.orm, project, { name: 'Wardrobe doors' });
    const user = await makeUser(w.ctx.orm, { name: 'A client' });
    const em = w.ctx.orm.em.fork();
    em.create(ProjectClient, { project: em.getReference(Project, project.id), user: em.getReference(User, user.id) });
    await em.flush();
    const client = await signedIn(w.ctx.app, user);
    await c('designer').delete(`/api/frames/${frame.id}`).expect(204);

    expect((await client.get(`/api/projects/${project.id}/frames?deleted=true`).expect(200)).body).toEqual([]);
    expect((await client.get(`/api/frames/${frame.id}`)).status).toBe(404);
    expect((await client.post(`/api/frames/${frame.id}/restore`)).status).toBe(404);
    expect((await client.get(`/api/workshops/${w.workshopId}/bin`)).status).toBe(404);
    await c('owner').delete(`/api/projects/${project.id}`).expect(204);
    expect((await client.post(`/api/projects/${project.id}/restore`)).status).toBe(404);
    expect((await client.get(`/api/frames/${other.id}`)).status).toBe(404);
    const me = (await client.get('/api/auth/me').expect(200)).body as { clientProjects: unknown[] };
    expect(me.clientProjects).toEqual([]);
  });
});
