import { describe, expect, it } from 'vitest';
import { PasswordReset } from '../../server/modules/auth/password-reset.entity';
import { User } from '../../server/modules/users/user.entity';
import { ApiClient, signedIn } from '../support/api-client';
import { makeUser } from '../support/factories';
import { useShopWorld, type ShopWorld } from './shop-world';
import { linkToken } from '../support/mail-links';

// Password reset end to end through the fake SMTP server, and changing a password while signed in.

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});

async function anon(): Promise<ApiClient> {
  const a = new ApiClient(w.ctx.app);
  await a.fetchCsrf();
  return a;
}

async function askReset(email: string): Promise<{ status: number; body: unknown }> {
  const res = await (await anon()).post('/api/auth/password-reset', { email });
  return { status: res.status, body: res.body };
}

describe('forgotten password', () => {
  it('answers the same whether or not the address has an account, and mails only an account', async () => {
    const user = await makeUser(w.ctx.orm, { name: 'Forgetful' });
    const arrived = w.fake.next();
    const known = await askReset(user.email);
    const mail = await arrived;
    const before = w.fake.received().length;
    const unknown = await askReset('nobody-here@person.test');
    expect(unknown).toEqual(known);
    expect(known.status).toBe(202);
    await new Promise((r) => setTimeout(r, 300));
    expect(w.fake.received().length).toBe(before);
    expect(mail.envelopeTo).toEqual([user.email]);
    expect(mail.kind).toBe('password-reset');
    // only the hash of the token is stored
    const token = linkToken(mail, 'reset-password');
    const rows = await w.ctx.orm.em.fork().find(PasswordReset, { user: user.id });
    expect(rows).toHaveLength(1);
    expect(rows[0].tokenHash).not.toContain(token);
    expect(rows[0].tokenHash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('the link sets a new password once, ends every session of the account, and the old password stops working', async () => {
    const user = await makeUser(w.ctx.orm, { name: 'Two devices' });
    const laptop = await signedIn(w.ctx.app, user);
    const phone = await signedIn(w.ctx.app, user);
    const arrived = w.fake.next();
    await askReset(user.email);
    const token = linkToken(await arrived, 'reset-password');
    const guest = await anon();
    expect((await guest.post('/api/auth/password-reset/confirm', { token, password: 'short' })).status).toBe(400);
    await guest.post('/api/auth/password-reset/confirm', { token, password: 'a brand new secret' }).expect(204);
    expect((await laptop.get('/api/auth/me')).status).toBe(401);
    expect((await phone.get('/api/auth/me')).status).toBe(401);
    expect((await new ApiClient(w.ctx.app).signIn(user.email, user.password)).status).toBe(401);
    expect((await new ApiClient(w.ctx.app).signIn(user.email, 'a brand new secret')).status).toBe(200);
    const reuse = await guest.post('/api/auth/password-reset/confirm', { token, password: 'yet another secret' });
    expect(reuse.status).toBe(422);
    expect((await new ApiClient(w.ctx.app).signIn(user.email, 'a brand new secret')).status).toBe(200);
  });

  it('refuses an expired link and a made-up one', async () => {
    const user = await makeUser(w.ctx.orm, { name: 'Slow reader' });
    const arrived = w.fake.next();
    await askReset(user.email);
    const token = linkToken(await arrived, 'reset-password');
    await w.ctx.orm.em.fork().nativeUpdate(PasswordReset, { user: user.id }, { expiresAt: new Date(Date.now() - 1000) });
    const guest = await anon();
    expect((await guest.post('/api/auth/password-reset/confirm', { token, password: 'a brand new secret' })).status).toBe(422);
    expect((await guest.post('/api/auth/password-reset/confirm', { token: 'A'.repeat(43), password: 'a brand new secret' })).status).toBe(422);
    const stored = await w.ctx.orm.em.fork().findOneOrFail(User, { id: user.id });
    expect(stored.passwordHash).toBeTruthy();
    expect((await new ApiClient(w.ctx.app).signIn(user.email, user.password)).status).toBe(200);
  });
});

describe('changing the password', () => {
  it('needs the current password, keeps this session and ends the others', async () => {
    const user = await makeUser(w.ctx.orm, { name: 'Careful' });
    const here = await signedIn(w.ctx.app, user);
    const elsewhere = await signedIn(w.ctx.app, user);
    const wrong = await here.post('/api/auth/password', { currentPassword: 'not it at all', password: 'a fresh long secret' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.currentPassword).toBeTruthy();
    const ok = await here.post('/api/auth/password', { currentPassword: user.password, password: 'a fresh long secret' });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    here.csrf = ok.body.csrfToken;
    expect((await here.get('/api/auth/me')).status).toBe(200);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    expect((await new ApiClient(w.ctx.app).signIn(user.email, 'a fresh long secret')).status).toBe(200);
    expect((await (await anon()).post('/api/auth/password', { currentPassword: 'x', password: 'a fresh long secret' })).status).toBe(401);
  });
});
