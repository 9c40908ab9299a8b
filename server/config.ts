import { randomBytes } from 'node:crypto';
import { z } from 'zod';
import type { MailConfig } from './mail/mail-config';

// The only place that reads process.env. Everything else receives a validated Config.

const booleanText = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  DATABASE_URL: z
    .string({ message: 'DATABASE_URL is required (e.g. postgres://slotwright@127.0.0.1:55432/slotwright)' })
    .regex(/^postgres(ql)?:\/\//, { message: 'DATABASE_URL must be a postgres:// URL' }),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().min(1).default('127.0.0.1'),
  SESSION_SECRET: z.string().min(16, { message: 'SESSION_SECRET must be at least 16 characters' }).optional(),
  // 'auto' marks the cookie Secure when the request came over https (directly or via a trusted proxy).
  COOKIE_SECURE: z.enum(['auto', 'true', 'false']).default('auto'),
  // Express "trust proxy": false, true, a hop count, or a comma-separated list of addresses/subnets.
  TRUST_PROXY: z.string().default('false'),
  SESSION_MAX_AGE_HOURS: z.coerce.number().positive().default(24 * 14),
  BODY_LIMIT: z.string().regex(/^\d+(b|kb|mb)$/i, { message: 'BODY_LIMIT like 2mb' }).default('2mb'),
  SIGNIN_RATE_MAX: z.coerce.number().int().positive().default(10),
  SIGNIN_RATE_WINDOW_MIN: z.coerce.number().positive().default(15),
  SIGNUP_RATE_MAX: z.coerce.number().int().positive().default(20),
  BCRYPT_COST: z.coerce.number().int().min(10).max(15).default(12),
  // The built client (vite build output); served with an SPA fallback when the folder exists.
  CLIENT_DIR: z.string().default('dist'),
  SERVE_CLIENT: booleanText.optional(),
  DB_POOL_MAX: z.coerce.number().int().positive().default(10),
  LOG_SQL: booleanText.default(false),
  // Outgoing mail. With no SMTP_HOST the project's local fake server on 127.0.0.1 takes (and keeps) every message.
  SMTP_HOST: z.string().min(1).optional(),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  SMTP_SECURE: booleanText.optional(),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  SMTP_FROM: z.string().min(3).default('Slotwright <no-reply@slotwright.test>'),
  MAIL_FAKE_DIR: z.string().default('.data/mail-fake'),
  // Where people open the app: the start of every link in an invitation or reset e-mail. Taken from here and
  // never from the request's Host header, which a caller could set to their own site.
  APP_URL: z.url({ message: 'APP_URL must be a URL like https://slotwright.example.com' }).optional(),
  INVITATION_DAYS: z.coerce.number().positive().max(90).default(7),
  RESET_MINUTES: z.coerce.number().positive().max(24 * 60).default(60),
});

export interface Config {
  env: 'development' | 'production' | 'test';
  databaseUrl: string;
  port: number;
  host: string;
  sessionSecret: string;
  /** True when no SESSION_SECRET was given and one was made up for this process (sessions end with it). */
  sessionSecretGenerated: boolean;
  cookieSecure: boolean | 'auto';
  trustProxy: boolean | number | string;
  sessionMaxAgeMs: number;
  bodyLimit: string;
  signInRateLimit: { max: number; windowMs: number };
  signUpRateLimit: { max: number; windowMs: number };
  bcryptCost: number;
  clientDir: string;
  serveClient: boolean;
  dbPoolMax: number;
  logSql: boolean;
  mail: MailConfig;
  /** Origin of links in e-mails, without a trailing slash. */
  appUrl: string;
  invitationTtlMs: number;
  resetTtlMs: number;
}

export class ConfigError extends Error {
  override name = 'ConfigError';
}

function parseTrustProxy(value: string): boolean | number | string {
  if (value === 'true') return true;
  if (value === 'false' || value === '') return false;
  if (/^\d+$/.test(value)) return Number(value);
  return value;
}

/** Reads and validates the environment once; throws ConfigError naming every bad variable. */
export function loadConfig(env: Record<string, string | undefined> = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.') || '(env)'}: ${i.message}`);
    throw new ConfigError(`Invalid environment:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  if (e.NODE_ENV === 'production' && !e.SESSION_SECRET) {
    throw new ConfigError('Invalid environment:\n  SESSION_SECRET: required when NODE_ENV=production');
  }
  return {
    env: e.NODE_ENV,
    databaseUrl: e.DATABASE_URL,
    port: e.PORT,
    host: e.HOST,
    sessionSecret: e.SESSION_SECRET ?? randomBytes(32).toString('hex'),
    sessionSecretGenerated: !e.SESSION_SECRET,
    cookieSecure: e.COOKIE_SECURE === 'auto' ? 'auto' : e.COOKIE_SECURE === 'true',
    trustProxy: parseTrustProxy(e.TRUST_PROXY),
    sessionMaxAgeMs: e.SESSION_MAX_AGE_HOURS * 3_600_000,
    bodyLimit: e.BODY_LIMIT.toLowerCase(),
    signInRateLimit: { max: e.SIGNIN_RATE_MAX, windowMs: e.SIGNIN_RATE_WINDOW_MIN * 60_000 },
    signUpRateLimit: { max: e.SIGNUP_RATE_MAX, windowMs: e.SIGNIN_RATE_WINDOW_MIN * 60_000 },
    bcryptCost: e.BCRYPT_COST,
    clientDir: e.CLIENT_DIR,
    serveClient: e.SERVE_CLIENT ?? e.NODE_ENV === 'production',
    dbPoolMax: e.DB_POOL_MAX,
    logSql: e.LOG_SQL,
    appUrl: (e.APP_URL ?? `http://${e.HOST}:${e.PORT}`).replace(/\/+$/, ''),
    invitationTtlMs: e.INVITATION_DAYS * 86_400_000,
    resetTtlMs: e.RESET_MINUTES * 60_000,
    mail: {
      host: e.SMTP_HOST ?? '127.0.0.1',
      port: e.SMTP_PORT ?? (e.SMTP_HOST ? (e.SMTP_SECURE ? 465 : 587) : 2525),
      secure: e.SMTP_SECURE ?? false,
      user: e.SMTP_USER || null,
      pass: e.SMTP_PASS || null,
      from: e.SMTP_FROM,
      fake: !e.SMTP_HOST,
      fakeDir: e.MAIL_FAKE_DIR,
    },
  };
}
