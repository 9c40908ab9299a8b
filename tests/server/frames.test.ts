import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { frameSchema, frameSummarySchema, revisionSchema, revisionSummarySchema } from '@shared/api/frames';
import { apiErrorSchema } from '@shared/api/errors';
import { projectDetailSchema } from '@shared/api/projects';
import type { ApiClient } from '../support/api-client';
import { signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop, sampleDocument, storedFrame } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

let ctx: TestContext;
let designer: ApiClient;
let owner: ApiClient;
let designerUser: { id: string; name: string };
let projectId: string;

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  const o = await makeUser(ctx.orm, { name: 'Olive Owner' });
  const d = await makeUser(ctx.orm, { name: 'Dev Designer' });
  designerUser = d;
  const workshop = await makeWorkshop(ctx.orm, [
    { user: o, role: 'owner' },
    { user: d, role: 'designer' },
  ]);
  projectId = (await makeProject(ctx.orm, workshop)).id;
  owner = await signedIn(ctx.app, o);
  designer = await signedIn(ctx.app, d);
});
afterAll(() => ctx.close());
afterEach(() => {
  expect(ctx.loggedErrors).toEqual([]);
});

async function newFrame(name = 'Galley carcass', document = sampleDocument(2, 'v1')) {
  const res = await designer.post(`/api/projects/${projectId}/frames`, { name, document }).expect(201);
  return frameSchema.parse(res.body);
}

describe('creating and reading frames', () => {
  it('creates a frame at version 1 with the document, its member count and who saved it', async () => {
    const frame = await newFrame('Fridge housing', sampleDocument(4));
    expect(frame).toMatchObject({ name: 'Fridge housing', version: 1, memberCount: 4, projectId, role: 'designer', deletedAt: null });
    expect(frame.updatedBy).toEqual({ id: designerUser.id, name: 'Dev Designer' });
    const read = frameSchema.parse((await owner.get(`/api/frames/${frame.id}`).expect(200)).body);
    expect(read.document).toEqual(sampleDocument(4));
    expect(read.role).toBe('owner');
  });

  it('starts from an empty document when none is sent', async () => {
    const res = await designer.post(`/api/projects/${projectId}/frames`, { name: 'Blank' }).expect(201);
    expect(res.body.memberCount).toBe(0);
    expect(res.body.document).toMatchObject({ schemaVersion: 1, members: [] });
  });

  it('refuses a document that is not a frame document: 422 naming the field, nothing created', async () => {
    const before = (await owner.get(`/api/projects/${projectId}/frames`).expect(200)).body.length;
    const res = await designer.post(`/api/projects/${projectId}/frames`, { name: 'Bad', document: { schemaVersion: 1, members: 'many' } });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('unprocessable');
    expect(res.body.error.fields).toHaveProperty(['document.members']);
    expect((await owner.get(`/api/projects/${projectId}/frames`).expect(200)).body.length).toBe(before);
  });

  it('lists the project with its live frames', async () => {
    const frame = await newFrame('Listed');
    const project = projectDetailSchema.parse((await owner.get(`/api/projects/${projectId}`).expect(200)).body);
    expect(project.frames.map((f) => f.id)).toContain(frame.id);
  });
});

describe('saving with optimistic locking', () => {
  it('saves on the current version: version + 1, the previous document kept as a revision', async () => {
    const frame = await newFrame();
    const v2 = sampleDocument(3, 'v2');
    const res = await designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: v2 }).expect(200);
    expect(res.body).toEqual({ version: 2, updatedAt: expect.any(String) });

    const stored = await storedFrame(ctx.orm, frame.id);
    expect(stored.version).toBe(2);
    expect(stored.document).toEqual(v2);
    expect(stored.memberCount).toBe(3);
    expect(stored.revisions).toEqual([{ version: 1, document: sampleDocument(2, 'v1'), memberCount: 2 }]);
  });

  it('a stale save gets 409 with the stored version, and nothing is lost or overwritten', async () => {
    const frame = await newFrame();
    const theirs = sampleDocument(5, 'theirs');
    await owner.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: theirs }).expect(200);
    const before = await storedFrame(ctx.orm, frame.id);

    // The designer still has version 1 open and saves over it.
    const res = await designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: sampleDocument(1, 'mine') });
    expect(res.status).toBe(409);
    const body = apiErrorSchema.parse(res.body);
    expect(body.error.code).toBe('version_conflict');
    expect(body.error.current).toMatchObject({ version: 2, document: theirs, savedBy: { name: 'Olive Owner' } });

    const after = await storedFrame(ctx.orm, frame.id);
    expect(after).toEqual(before);
    expect(after.document).toEqual(theirs);
    expect(after.revisions).toEqual([{ version: 1, document: sampleDocument(2, 'v1'), memberCount: 2 }]);
  });

  it('a save based on a version from the future is refused too', async () => {
    const frame = await newFrame();
    const res = await designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 7, document: sampleDocument(1) });
    expect(res.status).toBe(409);
    expect((await storedFrame(ctx.orm, frame.id)).version).toBe(1);
  });

  it('two saves racing from the same version: exactly one wins, the other gets 409', async () => {
    const frame = await newFrame();
    const [a, b] = await Promise.all([
      owner.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: sampleDocument(1, 'a') }),
      designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: sampleDocument(2, 'b') }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const stored = await storedFrame(ctx.orm, frame.id);
    expect(stored.version).toBe(2);
    expect(stored.revisions.map((r) => r.version)).toEqual([1]);
    expect(stored.document).toEqual(a.status === 200 ? sampleDocument(1, 'a') : sampleDocument(2, 'b'));
  });

  it('an invalid document is refused with 422 before anything is stored', async () => {
    const frame = await newFrame();
    const res = await designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: { schemaVersion: 'x', members: [] } });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toHaveProperty(['document.schemaVersion']);
    const stored = await storedFrame(ctx.orm, frame.id);
    expect(stored.version).toBe(1);
    expect(stored.revisions).toEqual([]);
  });

  it('renaming leaves the version alone', async () => {
    const frame = await newFrame('Old name');
    const res = await designer.patch(`/api/frames/${frame.id}`, { name: '  New name ' }).expect(200);
    expect(frameSummarySchema.parse(res.body)).toMatchObject({ name: 'New name', version: 1 });
    const stored = await storedFrame(ctx.orm, frame.id);
    expect(stored).toMatchObject({ name: 'New name', version: 1 });
    await designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: sampleDocument(1) }).expect(200);
  });
});

describe('revisions', () => {
  it('lists the current version first, then every earlier one, and returns each document', async () => {
    const frame = await newFrame();
    await designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: sampleDocument(3, 'v2') }).expect(200);
    await owner.put(`/api/frames/${frame.id}/document`, { baseVersion: 2, document: sampleDocument(4, 'v3') }).expect(200);

    const list = revisionSummarySchema.array().parse((await owner.get(`/api/frames/${frame.id}/revisions`).expect(200)).body);
    expect(list.map((r) => [r.version, r.current, r.memberCount, r.savedBy?.name])).toEqual([
      [3, true, 4, 'Olive Owner'],
      [2, false, 3, 'Dev Designer'],
      [1, false, 2, 'Dev Designer'],
    ]);

    const v1 = revisionSchema.parse((await owner.get(`/api/frames/${frame.id}/revisions/1`).expect(200)).body);
    expect(v1.document).toEqual(sampleDocument(2, 'v1'));
    const v3 = revisionSchema.parse((await owner.get(`/api/frames/${frame.id}/revisions/3`).expect(200)).body);
    expect(v3.document).toEqual(sampleDocument(4, 'v3'));
    const missing = await owner.get(`/api/frames/${frame.id}/revisions/9`);
    expect(missing.status).toBe(404);
    expect(missing.body.error.fields).toHaveProperty('version');
  });
});

describe('deleting and restoring', () => {
  it('soft-deletes: gone from the live list, listed with ?deleted=true, restorable with its document', async () => {
    const frame = await newFrame('To bin');
    await designer.delete(`/api/frames/${frame.id}`).expect(204);

    const live = (await owner.get(`/api/projects/${projectId}/frames`).expect(200)).body as { id: string }[];
    expect(live.map((f) => f.id)).not.toContain(frame.id);
    const binned = frameSummarySchema.array().parse((await owner.get(`/api/projects/${projectId}/frames?deleted=true`).expect(200)).body);
    expect(binned.find((f) => f.id === frame.id)?.deletedAt).toEqual(expect.any(String));

    // A frame in the bin is in the bin only: no other route reads or edits it until it is restored.
    const save = await designer.put(`/api/frames/${frame.id}/document`, { baseVersion: 1, document: sampleDocument(1) });
    expect(save.status).toBe(404);
    expect((await designer.patch(`/api/frames/${frame.id}`, { name: 'x' })).status).toBe(404);
    expect((await designer.get(`/api/frames/${frame.id}`)).status).toBe(404);
    expect((await designer.get(`/api/frames/${frame.id}/revisions`)).status).toBe(404);

    const restored = frameSummarySchema.parse((await designer.post(`/api/frames/${frame.id}/restore`).expect(200)).body);
    expect(restored.deletedAt).toBeNull();
    const stored = await storedFrame(ctx.orm, frame.id);
    expect(stored).toMatchObject({ deletedAt: null, version: 1, document: sampleDocument(2, 'v1') });
  });

  it('frames of a deleted project are no longer reachable', async () => {
    const o = await makeUser(ctx.orm);
    const workshop = await makeWorkshop(ctx.orm, [{ user: o, role: 'owner' }]);
    const project = await makeProject(ctx.orm, workshop);
    const frame = await makeFrame(ctx.orm, project);
    const client = await signedIn(ctx.app, o);
    await client.delete(`/api/projects/${project.id}`).expect(204);
    expect((await client.get(`/api/frames/${frame.id}`)).status).toBe(404);
    expect((await client.get(`/api/projects/${project.id}`)).status).toBe(404);
    // The rows are kept (soft delete).
    expect((await storedFrame(ctx.orm, frame.id)).version).toBe(1);
  });
});
