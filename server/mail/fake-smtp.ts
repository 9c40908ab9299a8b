import { randomUUID } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { KIND_HEADER, WORKSHOP_HEADER } from './mailer';

// A local SMTP server for development and tests: it accepts every message on the loopback, keeps it in memory
// and (when given a folder) as a .eml file with a .json summary beside it, and never sends anything on.

export interface ReceivedMail {
  id: string;
  receivedAt: string;
  envelopeFrom: string;
  envelopeTo: string[];
  from: string;
  to: string;
  subject: string;
  text: string;
  kind: string | null;
  workshopId: string | null;
  attachments: { filename: string; contentType: string; size: number }[];
  size: number;
}

export interface FakeSmtp {
  host: string;
  port: number;
  received(): ReceivedMail[];
  /** Resolves with the next message received (or the n-th from now). */
  next(): Promise<ReceivedMail>;
  close(): Promise<void>;
}

const MAX_SIZE = 25 * 1024 * 1024;

const addressText = (a: AddressObject | AddressObject[] | undefined): string => (Array.isArray(a) ? a.map((x) => x.text).join(', ') : (a?.text ?? ''));

export async function summarise(id: string, raw: Buffer, envelope: { from: string; to: string[] }): Promise<ReceivedMail> {
  const parsed = await simpleParser(raw);
  const header = (name: string): string | null => {
    const v = parsed.headers.get(name.toLowerCase());
    return typeof v === 'string' ? v : null;
  };
  return {
    id,
    receivedAt: new Date().toISOString(),
    envelopeFrom: envelope.from,
    envelopeTo: envelope.to,
    from: addressText(parsed.from),
    to: addressText(parsed.to),
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    kind: header(KIND_HEADER),
    workshopId: header(WORKSHOP_HEADER),
    attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? 'attachment', contentType: a.contentType, size: a.size })),
    size: raw.length,
  };
}

export async function startFakeSmtp(opts: { host?: string; port?: number; dir?: string | null } = {}): Promise<FakeSmtp> {
  const host = opts.host ?? '127.0.0.1';
  const dir = opts.dir ?? null;
  if (dir) mkdirSync(dir, { recursive: true });
  const kept: ReceivedMail[] = [];
  const waiting: ((m: ReceivedMail) => void)[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: MAX_SIZE,
    banner: 'Slotwright local test mail server: messages are kept, never delivered',
    logger: false,
    onAuth(_auth, _session, cb) {
      cb(null, { user: 'local' });
    },
    onData(stream, session, cb) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const raw = Buffer.concat(chunks);
        const id = `${Date.now().toString(36)}-${randomUUID().slice(0, 8)}`;
        const envelope = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
        };
        summarise(id, raw, envelope)
          .then((mail) => {
            if (dir) {
              writeFileSync(join(dir, `${id}.eml`), raw);
              writeFileSync(join(dir, `${id}.json`), JSON.stringify(mail, null, 2));
            }
            kept.push(mail);
            waiting.splice(0).forEach((w) => w(mail));
            cb();
          })
          .catch((err: unknown) => cb(err instanceof Error ? err : new Error(String(err))));
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port ?? 0, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  const port = (server.server.address() as AddressInfo).port;
  return {
    host,
    port,
    received: () => [...kept],
    next: () => new Promise((resolve) => waiting.push(resolve)),
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
