import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import type { ReceivedMail } from './fake-smtp';

// What the local fake mail server kept, read back for the owner's outbox page.

const ID = /^[a-z0-9]+-[0-9a-f]{8}$/;

export function listOutbox(dir: string, workshopId: string, limit = 200): ReceivedMail[] {
  if (!existsSync(dir)) return [];
  const mails: ReceivedMail[] = [];
  for (const f of readdirSync(dir)) {
    if (!f.endsWith('.json')) continue;
    try {
      const m = JSON.parse(readFileSync(join(dir, f), 'utf8')) as ReceivedMail;
      if (m.workshopId === workshopId) mails.push(m);
    } catch {
      // A half-written file from a message arriving right now: it shows on the next read.
    }
  }
  return mails.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt)).slice(0, limit);
}

export function outboxMail(dir: string, workshopId: string, id: string): ReceivedMail | null {
  if (!ID.test(id)) return null;
  const file = join(dir, `${id}.json`);
  if (!existsSync(file)) return null;
  const m = JSON.parse(readFileSync(file, 'utf8')) as ReceivedMail;
  return m.workshopId === workshopId ? m : null;
}

export async function outboxAttachment(dir: string, workshopId: string, id: string, index: number): Promise<{ filename: string; contentType: string; content: Buffer } | null> {
  if (!outboxMail(dir, workshopId, id)) return null;
  const parsed = await simpleParser(readFileSync(join(dir, `${id}.eml`)));
  const a = parsed.attachments[index];
  return a ? { filename: a.filename ?? 'attachment', contentType: a.contentType, content: a.content } : null;
}
