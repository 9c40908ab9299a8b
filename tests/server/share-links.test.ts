import { describe, expect, it } from 'vitest';
import { sharedProjectSchema } from '@shared/api/sharing';
import { ShareLink } from '../../server/modules/sharing/share-link.entity';
import { ApiClient } from '../support/api-client';
import { refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';

// A read-only link to a project for someone with no account: it shows the design and the files shared with
// clients, expires, can be revoked, and is 404 after either.

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor) => w.clients.get(a)!;
const signedOut = () => new ApiClient(w.ctx.app);

describe('share links', () => {
  it.each(['cutter', 'viewer', 'outsider', 'anonymous'] as Actor[])('%s cannot make one', async (a) => {
    expect((await c(a).post(`/api/projects/${w.projectId}/share-links`, { days: 7 })).status).toBe(refusal(a));
  });

  it('bounds the lifetime', async () => {
    const res = await c('designer').post(`/api/projects/${w.projectId}/share-links`, { days: 400 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.days).toBe('At most 90 days');
  });

  it('opens signed out, read-only, without the shop notes or any price; revoked it is 404', async () => {
    const made = await c('designer').post(`/api/projects/${w.projectId}/share-links`, { days: 7 });
    expect(made.status).toBe(201);
    expect(made.body.url).toMatch(new RegExp(`/shared/${made.body.token}$`));
    const res = await signedOut().get(`/api/shared/${made.body.token}`);
    expect(res.status).toBe(200);
    const shared = sharedProjectSchema.parse(res.body);
    expect(shared.project.name).toBe('Rear kitchen pod');
    expect(shared.frames.map((f) => f.name)).toEqual(['Kitchen pod v1']);
    expect(JSON.stringify(res.body)).not.toMatch(/price|cost|supplier/i);
    // the link lists nothing it could change through
    expect((await signedOut().get(`/api/frames/${shared.frames[0].id}`)).status).toBe(401);
    const list = (await c('owner').get(`/api/projects/${w.projectId}/share-links`).expect(200)).body as { id: string; revokedAt: string | null }[];
    expect(list.find((l) => l.id === made.body.id)?.revokedAt).toBeNull();
    expect(JSON.stringify(list)).not.toContain(made.body.token);
    await c('owner').delete(`/api/share-links/${made.body.id}`).expect(204);
    expect((await signedOut().get(`/api/shared/${made.body.token}`)).status).toBe(404);
  });

  it('is 404 once expired, and for a token nobody made', async () => {
    const made = (await c('owner').post(`/api/projects/${w.projectId}/share-links`, { days: 1 }).expect(201)).body;
    expect((await signedOut().get(`/api/shared/${made.token}`)).status).toBe(200);
    await w.ctx.orm.em.fork().nativeUpdate(ShareLink, { id: made.id }, { expiresAt: new Date(Date.now() - 1) });
    expect((await signedOut().get(`/api/shared/${made.token}`)).status).toBe(404);
    expect((await signedOut().get(`/api/shared/${'B'.repeat(43)}`)).status).toBe(404);
    expect((await signedOut().get('/api/shared/short')).status).toBe(400);
  });
});
