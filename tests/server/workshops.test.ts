import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { memberSchema, workshopSummarySchema } from '@shared/api/workshops';
import { meResponseSchema } from '@shared/api/auth';
import { Membership } from '../../server/modules/workshops/membership.entity';
import { signedIn } from '../support/api-client';
import { makeUser, makeWorkshop, uniqueEmail } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
});
afterAll(() => ctx.close());
afterEach(() => {
  expect(ctx.loggedErrors).toEqual([]);
});

async function roles(workshopId: string): Promise<Record<string, string>> {
  const rows = await ctx.orm.em.fork().find(Membership, { workshop: workshopId }, { populate: ['user'] });
  return Object.fromEntries(rows.map((m) => [m.user.email, m.role]));
}

describe('workshops', () => {
  it('the creator becomes its owner; the list shows role and member count', async () => {
    const u = await makeUser(ctx.orm);
    const client = await signedIn(ctx.app, u);
    const created = workshopSummarySchema.parse((await client.post('/api/workshops', { name: ' Unit 4 fabrication ' }).expect(201)).body);
    expect(created).toMatchObject({ name: 'Unit 4 fabrication', role: 'owner', memberCount: 1 });

    const other = await makeUser(ctx.orm);
    await client.post(`/api/workshops/${created.id}/members`, { email: other.email, role: 'cutter' }).expect(201);
    const list = workshopSummarySchema.array().parse((await client.get('/api/workshops').expect(200)).body);
    expect(list).toEqual([{ id: created.id, name: 'Unit 4 fabrication', role: 'owner', memberCount: 2 }]);

    const me = meResponseSchema.parse((await client.get('/api/auth/me').expect(200)).body);
    expect(me.memberships).toEqual([{ workshop: { id: created.id, name: 'Unit 4 fabrication' }, role: 'owner' }]);
  });

  it('lists only my workshops', async () => {
    const me = await makeUser(ctx.orm);
    const stranger = await makeUser(ctx.orm);
    await makeWorkshop(ctx.orm, [{ user: stranger, role: 'owner' }], 'Not mine');
    const mine = await makeWorkshop(ctx.orm, [{ user: me, role: 'viewer' }], 'Mine');
    const client = await signedIn(ctx.app, me);
    const list = (await client.get('/api/workshops').expect(200)).body as { id: string }[];
    expect(list.map((w) => w.id)).toEqual([mine.id]);
  });

  it('the owner renames it', async () => {
    const u = await makeUser(ctx.orm);
    const w = await makeWorkshop(ctx.orm, [{ user: u, role: 'owner' }]);
    const client = await signedIn(ctx.app, u);
    const res = await client.patch(`/api/workshops/${w.id}`, { name: 'Harbour shed' }).expect(200);
    expect(res.body).toMatchObject({ id: w.id, name: 'Harbour shed', role: 'owner', memberCount: 1 });
  });
});

describe('members', () => {
  it('the owner adds an existing user by e-mail (any case) with a role', async () => {
    const owner = await makeUser(ctx.orm);
    const newcomer = await makeUser(ctx.orm, { name: 'Nia' });
    const w = await makeWorkshop(ctx.orm, [{ user: owner, role: 'owner' }]);
    const client = await signedIn(ctx.app, owner);
    const res = await client.post(`/api/workshops/${w.id}/members`, { email: newcomer.email.toUpperCase(), role: 'designer' }).expect(201);
    expect(memberSchema.parse(res.body)).toEqual({ user: { id: newcomer.id, email: newcomer.email, name: 'Nia' }, role: 'designer' });
    const members = memberSchema.array().parse((await client.get(`/api/workshops/${w.id}/members`).expect(200)).body);
    expect(members.map((m) => [m.user.id, m.role]).sort()).toEqual([[owner.id, 'owner'], [newcomer.id, 'designer']].sort());
  });

  it('an unknown e-mail → 404 naming the e-mail field; an existing member → 409', async () => {
    const owner = await makeUser(ctx.orm);
    const w = await makeWorkshop(ctx.orm, [{ user: owner, role: 'owner' }]);
    const client = await signedIn(ctx.app, owner);
    const unknown = await client.post(`/api/workshops/${w.id}/members`, { email: uniqueEmail('ghost'), role: 'viewer' });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.fields).toHaveProperty('email');
    const again = await client.post(`/api/workshops/${w.id}/members`, { email: owner.email, role: 'viewer' });
    expect(again.status).toBe(409);
    expect(again.body.error.fields).toHaveProperty('email');
  });

  it('never leaves a workshop without an owner: demoting or removing the last owner → 422, unchanged', async () => {
    const owner = await makeUser(ctx.orm);
    const d = await makeUser(ctx.orm);
    const w = await makeWorkshop(ctx.orm, [
      { user: owner, role: 'owner' },
      { user: d, role: 'designer' },
    ]);
    const client = await signedIn(ctx.app, owner);
    const demote = await client.patch(`/api/workshops/${w.id}/members/${owner.id}`, { role: 'designer' });
    expect(demote.status).toBe(422);
    expect(demote.body.error.code).toBe('unprocessable');
    const remove = await client.delete(`/api/workshops/${w.id}/members/${owner.id}`);
    expect(remove.status).toBe(422);
    expect(await roles(w.id)).toEqual({ [owner.email]: 'owner', [d.email]: 'designer' });

    // With a second owner, the first may step down.
    await client.patch(`/api/workshops/${w.id}/members/${d.id}`, { role: 'owner' }).expect(200);
    await client.patch(`/api/workshops/${w.id}/members/${owner.id}`, { role: 'viewer' }).expect(200);
    expect(await roles(w.id)).toEqual({ [owner.email]: 'viewer', [d.email]: 'owner' });
  });

  it('two owners demoting each other at once leave one owner', async () => {
    const a = await makeUser(ctx.orm);
    const b = await makeUser(ctx.orm);
    const w = await makeWorkshop(ctx.orm, [
      { user: a, role: 'owner' },
      { user: b, role: 'owner' },
    ]);
    const [ca, cb] = await Promise.all([signedIn(ctx.app, a), signedIn(ctx.app, b)]);
    const results = await Promise.all([
      ca.patch(`/api/workshops/${w.id}/members/${b.id}`, { role: 'viewer' }),
      cb.patch(`/api/workshops/${w.id}/members/${a.id}`, { role: 'viewer' }),
    ]);
    const statuses = results.map((r) => r.status).sort();
    // Whichever runs second is either refused (last owner) or, having lost its owner role, forbidden.
    expect(statuses[0]).toBe(200);
    expect([403, 422]).toContain(statuses[1]);
    expect(Object.values(await roles(w.id)).filter((r) => r === 'owner')).toHaveLength(1);
  });

  it('removing a member takes away their access', async () => {
    const owner = await makeUser(ctx.orm);
    const v = await makeUser(ctx.orm);
    const w = await makeWorkshop(ctx.orm, [
      { user: owner, role: 'owner' },
      { user: v, role: 'viewer' },
    ]);
    const [co, cv] = await Promise.all([signedIn(ctx.app, owner), signedIn(ctx.app, v)]);
    await cv.get(`/api/workshops/${w.id}/projects`).expect(200);
    await co.delete(`/api/workshops/${w.id}/members/${v.id}`).expect(204);
    expect((await cv.get(`/api/workshops/${w.id}/projects`)).status).toBe(404);
    expect((await co.delete(`/api/workshops/${w.id}/members/${v.id}`)).status).toBe(404);
  });
});
