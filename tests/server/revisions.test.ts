import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import {
  REVISION_PAUSE_MINUTES,
  frameSchema,
  revisionComparisonSchema,
  revisionSchema,
  revisionSummarySchema,
  type FrameDocumentJson,
} from '@shared/api/frames';
import { computeReport } from '@shared/engine/report';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { reportWithSheetGoods } from '@shared/panels/report-with-goods';
import { Frame } from '../../server/modules/frames/frame.entity';
import { ProjectClient } from '../../server/modules/access/project-client.entity';
import { Project } from '../../server/modules/projects/project.entity';
import { User } from '../../server/modules/users/user.entity';
import type { ApiClient } from '../support/api-client';
import { signedIn } from '../support/api-client';
import { makeProject, makeUser, makeWorkshop, sampleDocument, storedFrame } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

let ctx: TestContext;
let owner: ApiClient;
let designer: ApiClient;
let cutter: ApiClient;
let client: ApiClient;
let projectId: string;

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  const [o, d, c, cl] = [
    await makeUser(ctx.orm, { name: 'Olive Owner' }),
    await makeUser(ctx.orm, { name: 'Dev Designer' }),
    await makeUser(ctx.orm, { name: 'Cora Cutter' }),
    await makeUser(ctx.orm, { name: 'Kim Client' }),
  ];
  const workshop = await makeWorkshop(ctx.orm, [
    { user: o, role: 'owner' },
    { user: d, role: 'designer' },
    { user: c, role: 'cutter' },
  ]);
  projectId = (await makeProject(ctx.orm, workshop)).id;
  const em = ctx.orm.em.fork();
  em.create(ProjectClient, { project: em.getReference(Project, projectId), user: em.getReference(User, cl.id) });
  await em.flush();
  owner = await signedIn(ctx.app, o);
  designer = await signedIn(ctx.app, d);
  cutter = await signedIn(ctx.app, c);
  client = await signedIn(ctx.app, cl);
});
afterAll(() => ctx.close());
afterEach(() => {
  expect(ctx.loggedErrors).toEqual([]);
});

/** A frame started empty, as the editor starts one. */
async function blankFrame() {
  return frameSchema.parse((await designer.post(`/api/projects/${projectId}/frames`, { name: 'Bench' }).expect(201)).body);
}

async function save(who: ApiClient, frameId: string, baseVersion: number, document: FrameDocumentJson): Promise<number> {
  return (await who.put(`/api/frames/${frameId}/document`, { baseVersion, document }).expect(200)).body.version;
}

async function revisions(who: ApiClient, frameId: string) {
  return revisionSummarySchema.array().parse((await who.get(`/api/frames/${frameId}/revisions`).expect(200)).body);
}

/** Moves the last save back in time, as if the person had paused for that long. */
async function pauseFor(frameId: string, minutes: number): Promise<void> {
  const em = ctx.orm.em.fork();
  const f = await em.findOneOrFail(Frame, { id: frameId });
  f.savedAt = new Date(f.savedAt.getTime() - minutes * 60_000);
  await em.flush();
}

const doc = (n: number, tag: string) => sampleDocument(n, tag);

describe('saves coalesce into one revision per editing stretch', () => {
  it('many quick saves by one person are versions, not revisions: only the stretch’s last state is listed', async () => {
    const f = await blankFrame();
    let v = 1;
    for (let i = 1; i <= 6; i++) v = await save(designer, f.id, v, doc(i, 'q'));
    expect(v).toBe(7);
    const list = await revisions(owner, f.id);
    expect(list.map((r) => [r.version, r.current, r.memberCount])).toEqual([[7, true, 6]]);
    // Every save still went through the version check: an old base version is refused.
    expect((await designer.put(`/api/frames/${f.id}/document`, { baseVersion: 6, document: doc(1, 'late') })).status).toBe(409);
  });

  it('a pause longer than the stretch keeps what was there before it', async () => {
    const f = await blankFrame();
    let v = await save(designer, f.id, 1, doc(2, 'a'));
    v = await save(designer, f.id, v, doc(3, 'a'));
    await pauseFor(f.id, REVISION_PAUSE_MINUTES + 1);
    v = await save(designer, f.id, v, doc(4, 'b'));
    v = await save(designer, f.id, v, doc(5, 'b'));
    expect((await revisions(owner, f.id)).map((r) => [r.version, r.memberCount])).toEqual([
      [5, 5],
      [3, 3],
    ]);
    // A shorter pause is the same stretch.
    await pauseFor(f.id, REVISION_PAUSE_MINUTES - 1);
    await save(designer, f.id, v, doc(6, 'c'));
    expect((await revisions(owner, f.id)).map((r) => r.version)).toEqual([6, 3]);
  });

  it('another person’s save ends the stretch', async () => {
    const f = await blankFrame();
    const v = await save(designer, f.id, 1, doc(2, 'd'));
    await save(owner, f.id, v, doc(3, 'o'));
    expect((await revisions(owner, f.id)).map((r) => [r.version, r.savedBy?.name])).toEqual([
      [3, 'Olive Owner'],
      [2, 'Dev Designer'],
    ]);
  });

  it('"Save revision" (also sent on leaving the editor) keeps the current state, and is refused on a stale version', async () => {
    const f = await blankFrame();
    const v = await save(designer, f.id, 1, doc(2, 'k'));
    const kept = revisionSummarySchema.parse((await designer.post(`/api/frames/${f.id}/revisions`, { baseVersion: v }).expect(200)).body);
    expect(kept).toMatchObject({ version: 2, current: true, name: null });
    await save(designer, f.id, v, doc(3, 'k'));
    expect((await revisions(owner, f.id)).map((r) => r.version)).toEqual([3, 2]);
    const stale = await designer.post(`/api/frames/${f.id}/revisions`, { baseVersion: v, name: 'too late' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect((await storedFrame(ctx.orm, f.id)).version).toBe(3);
  });
});

describe('naming revisions', () => {
  it('names the current version (keeping it) and an earlier one; names survive later saves; empty unnames', async () => {
    const f = await blankFrame();
    let v = await save(designer, f.id, 1, doc(2, 'n'));
    await designer.patch(`/api/frames/${f.id}/revisions/${v}`, { name: '  sent to client ' }).expect(200);
    v = await save(designer, f.id, v, doc(3, 'n'));
    await designer.post(`/api/frames/${f.id}/revisions`, { baseVersion: v, name: 'as cut' }).expect(200);
    v = await save(designer, f.id, v, doc(4, 'n'));
    expect((await revisions(client, f.id)).map((r) => [r.version, r.name])).toEqual([
      [4, null],
      [3, 'as cut'],
      [2, 'sent to client'],
    ]);
    expect(revisionSchema.parse((await owner.get(`/api/frames/${f.id}/revisions/2`).expect(200)).body).name).toBe('sent to client');
    const renamed = await owner.patch(`/api/frames/${f.id}/revisions/2`, { name: '' }).expect(200);
    expect(renamed.body).toMatchObject({ version: 2, name: null, current: false });
  });

  it('refuses a name that is too long, naming the field, and a version that was folded into a stretch', async () => {
    const f = await blankFrame();
    const v = await save(designer, f.id, 1, doc(2, 'l'));
    await save(designer, f.id, v, doc(3, 'l'));
    const long = await designer.patch(`/api/frames/${f.id}/revisions/3`, { name: 'x'.repeat(81) });
    expect(long.status).toBe(400);
    expect(long.body.error.fields).toHaveProperty('name');
    const folded = await designer.patch(`/api/frames/${f.id}/revisions/2`, { name: 'gone' });
    expect(folded.status).toBe(404);
    expect(folded.body.error.fields).toHaveProperty('version');
  });
});

describe('comparing two revisions', () => {
  it('marks added, removed and moved members and lists the cut-list and hardware differences', async () => {
    const base = demoFrameDocument() as unknown as FrameDocumentJson;
    const f = frameSchema.parse((await designer.post(`/api/projects/${projectId}/frames`, { name: 'Galley', document: base }).expect(201)).body);
    const changed = structuredClone(base) as { members: { id: string; length_mm?: number; start: { offset_mm: number } }[] };
    const removed = changed.members.pop()!;
    const moved = changed.members[0];
    moved.start = { ...moved.start, offset_mm: moved.start.offset_mm + 25 };
    changed.members.push({ ...structuredClone(changed.members[1]), id: 'extra-rail' });
    const v = await save(designer, f.id, 1, changed as unknown as FrameDocumentJson);

    const res = await client.get(`/api/frames/${f.id}/revisions/compare`).query({ from: 1, to: v }).expect(200);
    const { from, to, diff } = revisionComparisonSchema.parse(res.body);
    expect([from.version, to.version]).toEqual([1, 2]);
    const change = (id: string) => diff.members.find((m) => m.member_id === id)!;
    expect(change(removed.id)).toMatchObject({ change: 'removed', box_after: null, mark_after: null });
    expect(change('extra-rail')).toMatchObject({ change: 'added', box_before: null });
    expect(change(moved.id).change).toBe('moved');
    // Its start went 25 mm along; its centre moves by some of that (its end is held where the joints put it).
    expect(change(moved.id).moved_mm).toBeGreaterThan(0);
    expect(change(moved.id).moved_mm).toBeLessThanOrEqual(25.05);
    expect(diff.totals).toMatchObject({ added: 1, removed: 1, moved: 1 });
    expect(diff.totals.parts_after).toBe(diff.totals.parts_before);
    // The copied rail adds one part of its length; the removed member's length loses one.
    expect(diff.cut_list.length).toBeGreaterThan(0);
    for (const line of diff.cut_list) expect(line.qty_before === line.qty_after && line.mark_before === line.mark_after).toBe(false);
    // A comparison with itself has nothing to mark.
    const same = revisionComparisonSchema.parse((await owner.get(`/api/frames/${f.id}/revisions/compare?from=2&to=2`).expect(200)).body).diff;
    expect([same.totals.added, same.totals.removed, same.totals.moved, same.totals.changed, same.cut_list.length, same.hardware.length]).toEqual([0, 0, 0, 0, 0, 0]);
  });

  it('reads masses and hardware with the sheet goods, as the frame’s own report does', async () => {
    const base = demoFrameDocument();
    const f = frameSchema.parse((await designer.post(`/api/projects/${projectId}/frames`, { name: 'Galley goods', document: base as unknown as FrameDocumentJson }).expect(201)).body);
    const { diff } = revisionComparisonSchema.parse((await owner.get(`/api/frames/${f.id}/revisions/compare?from=1&to=1`).expect(200)).body);
    const withGoods = reportWithSheetGoods(base).report;
    // The demo galley's panels and drawer boxes weigh something, so leaving them out would read lighter.
    expect(withGoods.mass.total_kg).toBeGreaterThan(computeReport(base).mass.total_kg);
    expect(diff.totals.mass_after_kg).toBeCloseTo(withGoods.mass.total_kg, 6);
    expect(diff.totals.mass_before_kg).toBeCloseTo(withGoods.mass.total_kg, 6);
  });

  it('refuses a missing version (404) and a query that is not two version numbers (400 naming the field)', async () => {
    const f = await blankFrame();
    expect((await owner.get(`/api/frames/${f.id}/revisions/compare?from=1&to=9`)).status).toBe(404);
    const bad = await owner.get(`/api/frames/${f.id}/revisions/compare?from=one&to=1`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('from');
    // Past what a version column holds (PostgreSQL integer): refused as input, not sent to the database.
    const huge = await owner.get(`/api/frames/${f.id}/revisions/compare?from=1&to=99999999999`);
    expect(huge.status).toBe(400);
    expect(huge.body.error.fields).toHaveProperty('to');
  });
});

describe('restoring a revision', () => {
  it('saves the revision’s document as a new version; nothing of the history is lost', async () => {
    const f = await blankFrame();
    let v = await save(designer, f.id, 1, doc(2, 'r'));
    await designer.patch(`/api/frames/${f.id}/revisions/${v}`, { name: 'sent to client' }).expect(200);
    v = await save(designer, f.id, v, doc(5, 's'));
    v = await save(designer, f.id, v, doc(6, 's'));
    const res = await designer.post(`/api/frames/${f.id}/revisions/2/restore`, { baseVersion: v }).expect(200);
    expect(res.body.version).toBe(v + 1);
    const stored = await storedFrame(ctx.orm, f.id);
    expect(stored.document).toEqual(doc(2, 'r'));
    const list = await revisions(owner, f.id);
    expect(list.map((r) => [r.version, r.current, r.name])).toEqual([
      [5, true, 'Restored from 2 (sent to client)'],
      [4, false, null],
      [2, false, 'sent to client'],
    ]);
    // The state the restore replaced is there to go back to.
    expect((await owner.get(`/api/frames/${f.id}/revisions/4`).expect(200)).body.document).toEqual(doc(6, 's'));
    // Editing on after a restore keeps the restored state as its own revision.
    await save(designer, f.id, 5, doc(1, 't'));
    expect((await revisions(owner, f.id)).map((r) => r.version)).toEqual([6, 5, 4, 2]);
  });

  it('is guarded by the version like a save, and refuses the current version', async () => {
    const f = await blankFrame();
    const v = await save(owner, f.id, 1, doc(2, 'g'));
    await save(designer, f.id, v, doc(3, 'g'));
    const stale = await designer.post(`/api/frames/${f.id}/revisions/2/restore`, { baseVersion: 2 });
    expect(stale.status).toBe(409);
    expect((await storedFrame(ctx.orm, f.id)).version).toBe(3);
    const current = await designer.post(`/api/frames/${f.id}/revisions/3/restore`, { baseVersion: 3 });
    expect(current.status).toBe(422);
    expect(current.body.error.fields).toHaveProperty('version');
  });
});

describe('who may do what with revisions', () => {
  it('a cutter and a client read and compare but cannot keep, name or restore (403 for the cutter, 404 for the client)', async () => {
    const f = await blankFrame();
    const v = await save(designer, f.id, 1, doc(2, 'w'));
    await save(owner, f.id, v, doc(3, 'w'));
    for (const [who, status] of [
      [cutter, 403],
      [client, 404],
    ] as const) {
      expect((await who.get(`/api/frames/${f.id}/revisions`)).status).toBe(200);
      expect((await who.get(`/api/frames/${f.id}/revisions/compare?from=2&to=3`)).status).toBe(200);
      expect((await who.post(`/api/frames/${f.id}/revisions`, { baseVersion: 3 })).status).toBe(status);
      expect((await who.patch(`/api/frames/${f.id}/revisions/2`, { name: 'mine' })).status).toBe(status);
      expect((await who.post(`/api/frames/${f.id}/revisions/2/restore`, { baseVersion: 3 })).status).toBe(status);
    }
    const list = await revisions(owner, f.id);
    expect(list.map((r) => [r.version, r.name])).toEqual([
      [3, null],
      [2, null],
    ]);
  });

  it('a frame in the bin has no revisions to read, compare or restore until it is brought back', async () => {
    const f = await blankFrame();
    await designer.delete(`/api/frames/${f.id}`).expect(204);
    for (const who of [client, owner]) expect((await who.get(`/api/frames/${f.id}/revisions/compare?from=1&to=1`)).status).toBe(404);
    expect((await owner.post(`/api/frames/${f.id}/revisions`, { baseVersion: 1 })).status).toBe(404);
  });
});
