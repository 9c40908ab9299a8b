import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { projectDetailSchema, projectSummarySchema } from '@shared/api/projects';
import { Project } from '../../server/modules/projects/project.entity';
import type { ApiClient } from '../support/api-client';
import { signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

let ctx: TestContext;
let client: ApiClient;
let workshopId: string;

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  const d = await makeUser(ctx.orm);
  const o = await makeUser(ctx.orm);
  const w = await makeWorkshop(ctx.orm, [
    { user: o, role: 'owner' },
    { user: d, role: 'designer' },
  ]);
  workshopId = w.id;
  client = await signedIn(ctx.app, d);
});
afterAll(() => ctx.close());
afterEach(() => {
  expect(ctx.loggedErrors).toEqual([]);
});

describe('projects', () => {
  it('creates with optional client and notes (empty text when not given)', async () => {
    const a = projectSummarySchema.parse(
      (await client.post(`/api/workshops/${workshopId}/projects`, { name: 'Galley, long-wheelbase van', client: 'M. Ortiz', notes: 'Fridge left' }).expect(201)).body,
    );
    expect(a).toMatchObject({ name: 'Galley, long-wheelbase van', client: 'M. Ortiz', notes: 'Fridge left', frameCount: 0 });
    const b = (await client.post(`/api/workshops/${workshopId}/projects`, { name: 'Bench' }).expect(201)).body;
    expect(b).toMatchObject({ client: '', notes: '' });
  });

  it('lists live projects with live-frame counts, most recently changed first', async () => {
    const d = await makeUser(ctx.orm);
    const w = await makeWorkshop(ctx.orm, [
      { user: await makeUser(ctx.orm), role: 'owner' },
      { user: d, role: 'viewer' },
    ]);
    const older = await makeProject(ctx.orm, w, { name: 'Older' });
    await makeFrame(ctx.orm, older);
    await makeFrame(ctx.orm, older);
    await makeFrame(ctx.orm, older, { deletedAt: new Date() });
    const newer = await makeProject(ctx.orm, w, { name: 'Newer' });
    await makeProject(ctx.orm, w, { name: 'Binned', deletedAt: new Date() });
    const viewer = await signedIn(ctx.app, d);
    const list = projectSummarySchema.array().parse((await viewer.get(`/api/workshops/${w.id}/projects`).expect(200)).body);
    expect(list.map((p) => [p.name, p.frameCount])).toEqual([
      ['Newer', 0],
      ['Older', 2],
    ]);
    expect(list[0].id).toBe(newer.id);
  });

  it('updates any of name, client, notes; an empty patch is refused', async () => {
    const p = (await client.post(`/api/workshops/${workshopId}/projects`, { name: 'Bed frame' }).expect(201)).body as { id: string };
    await client.patch(`/api/projects/${p.id}`, { client: 'K. Ito' }).expect(200);
    const detail = projectDetailSchema.parse((await client.get(`/api/projects/${p.id}`).expect(200)).body);
    expect(detail).toMatchObject({ name: 'Bed frame', client: 'K. Ito', workshopId, role: 'designer', frames: [] });
    const empty = await client.patch(`/api/projects/${p.id}`, {});
    expect(empty.status).toBe(400);
  });

  it('delete is a soft delete: hidden from lists and reads, row kept', async () => {
    const o = await makeUser(ctx.orm);
    const w = await makeWorkshop(ctx.orm, [{ user: o, role: 'owner' }]);
    const p = await makeProject(ctx.orm, w);
    const owner = await signedIn(ctx.app, o);
    await owner.delete(`/api/projects/${p.id}`).expect(204);
    expect((await owner.get(`/api/workshops/${w.id}/projects`).expect(200)).body).toEqual([]);
    expect((await owner.get(`/api/projects/${p.id}`)).status).toBe(404);
    const row = await ctx.orm.em.fork().findOneOrFail(Project, { id: p.id });
    expect(row.deletedAt).toBeInstanceOf(Date);
  });
});
