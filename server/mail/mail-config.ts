/** How the server sends mail; built by server/config.ts from SMTP_* (the local fake on 127.0.0.1 when none is set). */
export interface MailConfig {
  host: string;
  port: number;
  /** TLS from the first byte (port 465); otherwise STARTTLS is used when the server offers it. */
  secure: boolean;
  user: string | null;
  pass: string | null;
  /** The From header, e.g. "Slotwright <orders@example.com>". */
  from: string;
  /** True when no SMTP_HOST was given: mail goes to the project's local fake server, which keeps it. */
  fake: boolean;
  /** Where the local fake keeps what it received (read by the owner's outbox page). */
  fakeDir: string;
}
