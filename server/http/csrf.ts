import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { HttpError } from '../errors';

// Synchronizer token: one random token per session, sent back by the client in X-CSRF-Token on every
// state-changing request. A cross-site page can make the browser send the cookie but cannot read the token.

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export function newCsrfToken(): string {
  return randomBytes(32).toString('base64url');
}

/** The session's token, created (which also stores an anonymous session) when it has none. */
export function ensureCsrfToken(req: Request): string {
  req.session.csrfToken ??= newCsrfToken();
  return req.session.csrfToken;
}

function sameToken(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

export function csrfProtection(): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const expected = req.session?.csrfToken;
    const sent = req.get('x-csrf-token');
    if (!expected || !sent || !sameToken(expected, sent)) {
      return next(new HttpError('csrf', 'Missing or invalid CSRF token: fetch /api/auth/csrf and send it in X-CSRF-Token'));
    }
    next();
  };
}
