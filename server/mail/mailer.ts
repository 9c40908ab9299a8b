import nodemailer from 'nodemailer';
import type { MailConfig } from './mail-config';

// The one way the server sends e-mail: orders to suppliers now, invitations and password resets later. Every
// message says which workshop and which kind of mail it is in its own headers, so the local outbox can show a
// workshop's owner just their mail.

export type MailKind = 'order' | 'invitation' | 'password-reset' | 'notice';

export interface MailAttachment {
  filename: string;
  content: Buffer;
  contentType: string;
}

export interface MailMessage {
  kind: MailKind;
  to: string;
  subject: string;
  text: string;
  replyTo?: string;
  workshopId?: string;
  attachments?: MailAttachment[];
}

export interface SentMail {
  messageId: string;
  accepted: string[];
  rejected: string[];
}

export interface Mailer {
  send(message: MailMessage): Promise<SentMail>;
  close(): void;
}

export const WORKSHOP_HEADER = 'X-Slotwright-Workshop';
export const KIND_HEADER = 'X-Slotwright-Kind';

export class MailError extends Error {
  override name = 'MailError';
}

export function createMailer(cfg: MailConfig): Mailer {
  const transport = nodemailer.createTransport({
    host: cfg.host,
    port: cfg.port,
    secure: cfg.secure,
    // The local fake speaks plain SMTP on the loopback; a real server gets STARTTLS when it offers it.
    ignoreTLS: cfg.fake,
    auth: cfg.user ? { user: cfg.user, pass: cfg.pass ?? '' } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return {
    async send(m) {
      try {
        const info = await transport.sendMail({
          from: cfg.from,
          to: m.to,
          replyTo: m.replyTo,
          subject: m.subject,
          text: m.text,
          headers: { [KIND_HEADER]: m.kind, ...(m.workshopId ? { [WORKSHOP_HEADER]: m.workshopId } : {}) },
          attachments: m.attachments?.map((a) => ({ filename: a.filename, content: a.content, contentType: a.contentType })),
        });
        const list = (v: unknown): string[] => (Array.isArray(v) ? v.map((x) => (typeof x === 'string' ? x : (x as { address: string }).address)) : []);
        return { messageId: info.messageId, accepted: list(info.accepted), rejected: list(info.rejected) };
      } catch (err) {
        const why = err instanceof Error ? err.message : String(err);
        throw new MailError(`The mail server at ${cfg.host}:${cfg.port} did not take the message (${why})`);
      }
    },
    close() {
      transport.close();
    },
  };
}
