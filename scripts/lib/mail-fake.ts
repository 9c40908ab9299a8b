// The local fake SMTP server the app mails through in development and tests, unless SMTP_HOST names a real one.
// It runs inside the calling script's process and keeps every message under .data/ for the owner's outbox page.
import { join, resolve } from 'node:path';
import { startFakeSmtp } from '../../server/mail/fake-smtp.ts';
import { projectRoot } from './postgres.ts';

export interface MailFake {
  /** The environment for the server, with SMTP_PORT and MAIL_FAKE_DIR pointing at the fake (unchanged for real SMTP). */
  env: NodeJS.ProcessEnv;
  stop(): Promise<void>;
}

export async function startMailFake(env: NodeJS.ProcessEnv, opts: { dir?: string; port?: number } = {}): Promise<MailFake> {
  if (env.SMTP_HOST) return { env, stop: async () => undefined };
  const dir = resolve(opts.dir ?? env.MAIL_FAKE_DIR ?? join(projectRoot, '.data/mail-fake'));
  const wanted = opts.port ?? Number(env.SMTP_PORT ?? 2525);
  let fake;
  try {
    fake = await startFakeSmtp({ port: wanted, dir });
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE') throw err;
    // Another copy of the app has the usual port: take any free one; the server is told which below.
    fake = await startFakeSmtp({ port: 0, dir });
  }
  console.log(`Local test mail server on 127.0.0.1:${fake.port} (messages kept in ${dir}, never delivered)`);
  return { env: { ...env, SMTP_PORT: String(fake.port), MAIL_FAKE_DIR: dir }, stop: () => fake.close() };
}
