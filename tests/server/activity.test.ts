import { describe, expect, it } from 'vitest';
import { activityEntrySchema, type ActivityEntry } from '@shared/api/activity';
import { Activity } from '../../server/modules/activity/activity.entity';
import { demoDocument, refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';

// A project's activity, kept in PostgreSQL: who saved, sent an order, ticked cuts, invited whom. Repeated saves
// by one person in one stretch are one entry with a count.

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor) => w.clients.get(a)!;
const list = async (): Promise<ActivityEntry[]> => activityEntrySchema.array().parse((await c('owner').get(`/api/projects/${w.projectId}/activity`).expect(200)).body);

describe('project activity', () => {
  it('groups a stretch of saves into one entry, and starts a new one after a pause', async () => {
    for (let v = 1; v <= 3; v++) await c('designer').put(`/api/frames/${w.frameId}/document`, { baseVersion: v, document: demoDocument() }).expect(200);
    let saves = (await list()).filter((e) => e.kind === 'frame.saved');
    expect(saves).toHaveLength(1);
    expect(saves[0]).toMatchObject({ count: 3, subject: 'Kitchen pod v1', user: { name: 'designer' } });
    await w.ctx.orm.em.fork().nativeUpdate(Activity, { kind: 'frame.saved' }, { lastAt: new Date(Date.now() - 60 * 60_000) });
    await c('designer').put(`/api/frames/${w.frameId}/document`, { baseVersion: 4, document: demoDocument() }).expect(200);
    saves = (await list()).filter((e) => e.kind === 'frame.saved');
    expect(saves.map((e) => e.count)).toEqual([1, 3]);
  });

  it('records invitations to the project and read-only links', async () => {
    await c('owner').post(`/api/workshops/${w.workshopId}/invitations`, { email: 'pat@client.test', role: 'client', projectIds: [w.projectId] }).expect(201);
    await c('designer').post(`/api/projects/${w.projectId}/share-links`, { days: 3 }).expect(201);
    const kinds = (await list()).map((e) => [e.kind, e.subject, e.user?.name]);
    expect(kinds).toContainEqual(['client.invited', 'pat@client.test', 'owner']);
    expect(kinds).toContainEqual(['link.made', 'valid 3 days', 'designer']);
  });

  it.each(['cutter', 'viewer', 'outsider', 'anonymous'] as Actor[])('%s: members read it, others are refused', async (a) => {
    const res = await c(a).get(`/api/projects/${w.projectId}/activity`);
    expect(res.status).toBe(['cutter', 'viewer'].includes(a) ? 200 : refusal(a));
  });
});
