import type { ReceivedMail } from '../../server/mail/fake-smtp';

/** The token from the link (".../path/TOKEN") in a received invitation or reset mail. */
export function linkToken(mail: ReceivedMail, path: string): string {
  const m = new RegExp(`https?://[^\\s]+/${path}/([A-Za-z0-9_-]{43})`).exec(mail.text);
  if (!m) throw new Error(`no ${path} link in: ${mail.text}`);
  return m[1];
}
