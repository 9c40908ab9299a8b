import { describe, expect, it } from 'vitest';
import type { ReceivedMail } from '../../server/mail/fake-smtp';
import { Invitation } from '../../server/modules/invitations/invitation.entity';
import { ApiClient, signedIn } from '../support/api-client';
import { linkToken } from '../support/mail-links';
import { makeProject, makeUser } from '../support/factories';
import { Workshop } from '../../server/modules/workshops/workshop.entity';
import { refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';

// Invitations end to end: the owner invites, the fake SMTP server keeps the mail, the link is read from it and
// opened by a new or existing account. Single use, expiry, withdrawal and the wrong account are refused.

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor) => w.clients.get(a)!;


async function inviteAndRead(body: unknown): Promise<{ mail: ReceivedMail; token: string; id: string }> {
  const arrived = w.fake.next();
  const res = await c('owner').post(`/api/workshops/${w.workshopId}/invitations`, body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  const mail = await arrived;
  return { mail, token: linkToken(mail, 'invitation'), id: res.body.id };
}

async function anon(): Promise<ApiClient> {
  const a = new ApiClient(w.ctx.app);
  await a.fetchCsrf();
  return a;
}

describe('invitations by e-mail', () => {
  it.each(['designer', 'cutter', 'viewer', 'outsider', 'anonymous'] as Actor[])('%s cannot invite', async (a) => {
    const res = await c(a).post(`/api/workshops/${w.workshopId}/invitations`, { email: 'new@person.test', role: 'designer' });
    expect(res.status).toBe(refusal(a));
  });

  it('names bad fields', async () => {
    const res = await c('owner').post(`/api/workshops/${w.workshopId}/invitations`, { email: 'not-mail', role: 'client', projectIds: [] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'projectIds']);
  });

  it('a new person accepts with a name and password, lands in the workshop with the role, and the link is spent', async () => {
    const { mail, token } = await inviteAndRead({ email: 'Newbie@Person.test', role: 'cutter' });
    expect(mail.envelopeTo).toEqual(['newbie@person.test']);
    expect(mail.kind).toBe('invitation');
    expect(mail.subject).toContain('Harbour Lane Van Works');
    const guest = await anon();
    const preview = await guest.get(`/api/invitations/${token}`).expect(200);
    expect(preview.body).toMatchObject({ workshop: 'Harbour Lane Van Works', email: 'newbie@person.test', role: 'cutter', hasAccount: false });
    const accepted = await guest.post(`/api/invitations/${token}/accept`, { name: 'New Cutter', password: 'a long enough secret' });
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
    guest.csrf = accepted.body.csrfToken;
    const me = (await guest.get('/api/auth/me').expect(200)).body;
    expect(me.user.email).toBe('newbie@person.test');
    expect(me.memberships).toEqual([{ workshop: { id: w.workshopId, name: 'Harbour Lane Van Works' }, role: 'cutter' }]);
    // single use
    const again = await (await anon()).post(`/api/invitations/${token}/accept`, { name: 'Someone', password: 'another long secret' });
    expect(again.status).toBe(404);
    expect((await (await anon()).get(`/api/invitations/${token}`)).status).toBe(404);
    // the new account signs in with the password it chose
    const back = new ApiClient(w.ctx.app);
    expect((await back.signIn('newbie@person.test', 'a long enough secret')).status).toBe(200);
  });

  it('an existing account must sign in as the invited address; another account is refused', async () => {
    const existing = await makeUser(w.ctx.orm, { name: 'Has an account' });
    const { token } = await inviteAndRead({ email: existing.email, role: 'designer' });
    const guest = await anon();
    expect((await guest.get(`/api/invitations/${token}`).expect(200)).body.hasAccount).toBe(true);
    const signedOut = await guest.post(`/api/invitations/${token}/accept`, { name: 'Impostor', password: 'a long enough secret' });
    expect(signedOut.status).toBe(401);
    const wrong = await c('outsider').post(`/api/invitations/${token}/accept`, {});
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.message).toContain(existing.email);
    const right = await signedIn(w.ctx.app, existing);
    const ok = await right.post(`/api/invitations/${token}/accept`, {});
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.role).toBe('designer');
    const members = (await c('owner').get(`/api/workshops/${w.workshopId}/members`).expect(200)).body as { user: { email: string }; role: string }[];
    expect(members.find((m) => m.user.email === existing.email)?.role).toBe('designer');
  });

  it('an expired invitation is refused, and so is a withdrawn one', async () => {
    const expired = await inviteAndRead({ email: 'late@person.test', role: 'viewer' });
    await w.ctx.orm.em.fork().nativeUpdate(Invitation, { id: expired.id }, { expiresAt: new Date(Date.now() - 1000) });
    const guest = await anon();
    expect((await guest.get(`/api/invitations/${expired.token}`)).status).toBe(404);
    expect((await guest.post(`/api/invitations/${expired.token}/accept`, { name: 'Late', password: 'a long enough secret' })).status).toBe(404);

    const withdrawn = await inviteAndRead({ email: 'withdrawn@person.test', role: 'viewer' });
    const pending = (await c('owner').get(`/api/workshops/${w.workshopId}/invitations`).expect(200)).body as { id: string }[];
    expect(pending.map((p) => p.id)).toContain(withdrawn.id);
    expect(pending.map((p) => p.id)).not.toContain(expired.id);
    expect((await c('designer').delete(`/api/invitations/${withdrawn.id}`)).status).toBe(403);
    await c('owner').delete(`/api/invitations/${withdrawn.id}`).expect(204);
    expect((await guest.post(`/api/invitations/${withdrawn.token}/accept`, { name: 'W', password: 'a long enough secret' })).status).toBe(404);
    expect((await (await anon()).post('/api/auth/signin', { email: 'withdrawn@person.test', password: 'a long enough secret' })).status).toBe(401);
  });

  it('a client is invited to some projects and sees exactly those', async () => {
    const em = w.ctx.orm.em.fork();
    const workshop = await em.findOneOrFail(Workshop, { id: w.workshopId });
    const second = await makeProject(w.ctx.orm, workshop, { name: 'Second job of the same client' });
    const third = await makeProject(w.ctx.orm, workshop, { name: 'Someone else’s job' });
    const { mail, token } = await inviteAndRead({ email: 'client@person.test', role: 'client', projectIds: [w.projectId, second.id] });
    expect(mail.text).toContain('Rear kitchen pod');
    expect(mail.text).toContain('Second job of the same client');
    expect(mail.text).not.toContain('Someone else');
    const guest = await anon();
    const ok = await guest.post(`/api/invitations/${token}/accept`, { name: 'Pat Client', password: 'a long enough secret' });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    guest.csrf = ok.body.csrfToken;
    const me = (await guest.get('/api/auth/me').expect(200)).body;
    expect(me.memberships).toEqual([]);
    expect(me.clientProjects.map((p: { project: { name: string } }) => p.project.name)).toEqual(['Rear kitchen pod', 'Second job of the same client']);
    expect((await guest.get(`/api/projects/${second.id}`)).status).toBe(200);
    expect((await guest.get(`/api/projects/${third.id}`)).status).toBe(404);
    expect((await guest.get(`/api/workshops/${w.workshopId}/projects`)).status).toBe(404);
    expect((await guest.get(`/api/workshops/${w.workshopId}/suppliers`)).status).toBe(404);
  });

  it('refuses to invite a project of another workshop, or a member as a client', async () => {
    const other = await c('outsider').post('/api/workshops', { name: 'Other bay' }).expect(201);
    const foreign = await c('outsider').post(`/api/workshops/${other.body.id}/projects`, { name: 'Not yours' }).expect(201);
    const res = await c('owner').post(`/api/workshops/${w.workshopId}/invitations`, { email: 'x@person.test', role: 'client', projectIds: [foreign.body.id] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.projectIds).toBeTruthy();
    const designerEmail = (await c('designer').get('/api/auth/me').expect(200)).body.user.email;
    const member = await c('owner').post(`/api/workshops/${w.workshopId}/invitations`, { email: designerEmail, role: 'client', projectIds: [w.projectId] });
    expect(member.status).toBe(409);
  });
});

describe('members and the last owner', () => {
  it('owners change roles and remove members; the last owner stays', async () => {
    const ownerId = w.userIds.get('owner')!;
    const demote = await c('owner').patch(`/api/workshops/${w.workshopId}/members/${ownerId}`, { role: 'designer' });
    expect(demote.status).toBe(422);
    expect((await c('owner').delete(`/api/workshops/${w.workshopId}/members/${ownerId}`)).status).toBe(422);
    const viewerId = w.userIds.get('viewer')!;
    expect((await c('owner').patch(`/api/workshops/${w.workshopId}/members/${viewerId}`, { role: 'client' })).status).toBe(400);
    await c('owner').patch(`/api/workshops/${w.workshopId}/members/${viewerId}`, { role: 'cutter' }).expect(200);
  });
});
