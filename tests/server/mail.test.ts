import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/config';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { createMailer, MailError } from '../../server/mail/mailer';
import { listOutbox, outboxAttachment, outboxMail } from '../../server/mail/outbox';

const baseEnv = { DATABASE_URL: 'postgres://x@127.0.0.1:1/x', NODE_ENV: 'test' };

describe('mail configuration', () => {
  it('uses the local fake on 127.0.0.1 when no SMTP host is set', () => {
    const c = loadConfig(baseEnv).mail;
    expect(c).toMatchObject({ host: '127.0.0.1', port: 2525, fake: true, user: null });
  });

  it('takes a real SMTP host, port, login and sender from the environment', () => {
    const c = loadConfig({ ...baseEnv, SMTP_HOST: 'smtp.example.com', SMTP_USER: 'shop', SMTP_PASS: 'pw', SMTP_FROM: 'Shop <shop@example.com>' }).mail;
    expect(c).toMatchObject({ host: 'smtp.example.com', port: 587, fake: false, user: 'shop', pass: 'pw', from: 'Shop <shop@example.com>' });
    expect(loadConfig({ ...baseEnv, SMTP_HOST: 'smtp.example.com', SMTP_SECURE: 'true' }).mail.port).toBe(465);
  });

  it('names a bad port', () => {
    expect(() => loadConfig({ ...baseEnv, SMTP_PORT: 'seventy' })).toThrow(/SMTP_PORT/);
  });
});

describe('sending through the local fake SMTP server', () => {
  let fake: FakeSmtp;
  let dir: string;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'slotwright-mail-'));
    fake = await startFakeSmtp({ port: 0, dir });
  });
  afterAll(async () => {
    await fake.close();
    rmSync(dir, { recursive: true, force: true });
  });

  const mailer = () =>
    createMailer({ host: fake.host, port: fake.port, secure: false, user: null, pass: null, from: 'Slotwright <no-reply@slotwright.test>', fake: true, fakeDir: dir });

  it('delivers text and attachment, keeps the message and files it under its workshop', async () => {
    const m = mailer();
    const pdf = Buffer.from('%PDF-1.7 pretend order');
    const arrived = fake.next();
    const sent = await m.send({
      kind: 'order',
      to: 'orders@supplier.test',
      subject: 'Order SW-1',
      text: 'Stock bars\n  2 × 40×40 slot 8, 6000 mm',
      workshopId: 'w-1',
      attachments: [{ filename: 'order.pdf', content: pdf, contentType: 'application/pdf' }],
    });
    m.close();
    expect(sent.accepted).toEqual(['orders@supplier.test']);
    const got = await arrived;
    expect(got).toMatchObject({ subject: 'Order SW-1', kind: 'order', workshopId: 'w-1', envelopeTo: ['orders@supplier.test'] });
    expect(got.text).toContain('2 × 40×40 slot 8');
    expect(got.attachments).toEqual([{ filename: 'order.pdf', contentType: 'application/pdf', size: pdf.length }]);
    expect(readdirSync(dir).sort()).toEqual([`${got.id}.eml`, `${got.id}.json`]);

    expect(listOutbox(dir, 'w-1').map((x) => x.id)).toEqual([got.id]);
    expect(listOutbox(dir, 'w-2')).toEqual([]);
    expect(outboxMail(dir, 'w-2', got.id)).toBeNull();
    expect(outboxMail(dir, 'w-1', '../../etc/passwd')).toBeNull();
    const att = await outboxAttachment(dir, 'w-1', got.id, 0);
    expect(att?.content.equals(pdf)).toBe(true);
  });

  it('reports an unreachable mail server as a MailError naming it', async () => {
    const closed = await startFakeSmtp({ port: 0 });
    const port = closed.port;
    await closed.close();
    const m = createMailer({ host: '127.0.0.1', port, secure: false, user: null, pass: null, from: 'a@b.test', fake: true, fakeDir: dir });
    await expect(m.send({ kind: 'notice', to: 'x@y.test', subject: 's', text: 't' })).rejects.toThrow(MailError);
    await expect(m.send({ kind: 'notice', to: 'x@y.test', subject: 's', text: 't' })).rejects.toThrow(`127.0.0.1:${port}`);
  });
});
