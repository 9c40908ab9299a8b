import type { ErrorRequestHandler } from 'express';
import type { ApiErrorBody } from '@shared/api/errors';
import { InputError } from '@shared/errors';
import { isDatabaseDown } from '../db';
import { HttpError, VersionConflictError } from '../errors';

export type ErrorLogger = (message: string, err: unknown) => void;

/** A status the error carries itself (body-parser, the router's URL decoding, raw-body, http-errors). */
function ownStatus(err: unknown): number | null {
  if (typeof err !== 'object' || err === null) return null;
  const e = err as { status?: unknown; statusCode?: unknown };
  const s = typeof e.status === 'number' ? e.status : typeof e.statusCode === 'number' ? e.statusCode : null;
  return s !== null && Number.isInteger(s) ? s : null;
}

const BODY_MESSAGES: Record<string, string> = {
  'entity.parse.failed': 'The request body is not valid JSON',
  'encoding.unsupported': 'The request body’s Content-Encoding is not supported',
  'charset.unsupported': 'The request body’s charset is not supported',
  'request.aborted': 'The request body was cut short',
  'request.size.invalid': 'The request body is not as long as its Content-Length says',
  'stream.encoding.set': 'The request body could not be read',
  'parameters.too.many': 'The request has too many parameters',
};

/** Maps an error to status + JSON body. Unknown errors become a bare 500: no message or stack leaves the server. */
export function toErrorResponse(err: unknown): { status: number; body: ApiErrorBody; unexpected: boolean; retryAfter?: number } {
  if (err instanceof HttpError) {
    const body: ApiErrorBody = { error: { code: err.code, message: err.message } };
    if (err.fields) body.error.fields = err.fields;
    if (err instanceof VersionConflictError) body.error.current = err.current;
    return { status: err.status, body, unexpected: false };
  }
  if (err instanceof InputError) {
    return {
      status: 422,
      body: { error: { code: 'unprocessable', message: err.message, fields: { [err.field]: err.message } } },
      unexpected: false,
    };
  }
  // Anything else that says it is the client's fault (a body that will not parse or decompress, a URL that
  // will not decode) is a 400, or a 413 when too large; never its own wording, which may name internals.
  const status = ownStatus(err);
  if (status !== null && status >= 400 && status < 500) {
    const type = (err as { type?: unknown }).type;
    if (status === 413 || type === 'entity.too.large') {
      return { status: 413, body: { error: { code: 'payload_too_large', message: 'The request body is too large' } }, unexpected: false };
    }
    const message = (typeof type === 'string' && BODY_MESSAGES[type]) || (err instanceof URIError ? 'The address is not valid (bad %-encoding)' : 'The request could not be read');
    return { status: 400, body: { error: { code: 'bad_request', message } }, unexpected: false };
  }
  // The client went away and its work was ended; nobody reads this answer.
  if (err instanceof Error && err.name === 'AbortError') {
    return { status: 400, body: { error: { code: 'bad_request', message: 'The request was cancelled' } }, unexpected: false };
  }
  if (isDatabaseDown(err)) {
    return { status: 503, body: { error: { code: 'unavailable', message: 'The database is not reachable; try again in a moment' } }, unexpected: false, retryAfter: 5 };
  }
  if (err instanceof URIError) {
    return { status: 400, body: { error: { code: 'bad_request', message: 'The address is not valid (bad %-encoding)' } }, unexpected: false };
  }
  return { status: 500, body: { error: { code: 'internal', message: 'Something went wrong on the server' } }, unexpected: true };
}

/**
 * What may be written to the log about an unexpected error: its kind, the database's error code and the first
 * line of its message, with any SQL (and so its parameter values: password hashes, e-mails, documents) cut off.
 */
export function loggableError(err: unknown): string {
  if (!(err instanceof Error)) return typeof err;
  const e = err as Error & { code?: unknown; sqlState?: unknown };
  const code = typeof e.code === 'string' ? e.code : typeof e.sqlState === 'string' ? e.sqlState : '';
  let message = e.message.split('\n')[0];
  // MikroORM writes "<the statement with its values> - <what PostgreSQL said>".
  const dash = message.lastIndexOf(' - ');
  if ('sql' in e || /^\s*(select|insert|update|delete|with|begin|commit)\b/i.test(message)) {
    message = dash >= 0 ? message.slice(dash + 3) : '(statement left out)';
  }
  // Stack frames only: the stack's first lines repeat the message, details (key values) included.
  const where = (e.stack ?? '').split('\n').filter((l) => /^\s+at /.test(l)).slice(0, 5).join('\n');
  return `${e.name}${code ? ` [${code}]` : ''}: ${message.slice(0, 300)}\n${where}`;
}

export function errorHandler(log: ErrorLogger): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) return next(err);
    const { status, body, unexpected, retryAfter } = toErrorResponse(err);
    if (retryAfter !== undefined) res.set('Retry-After', String(retryAfter));
    else if (err instanceof HttpError && err.retryAfterS !== undefined) res.set('Retry-After', String(err.retryAfterS));
    // The path only: a query string may carry a token or an e-mail address.
    if (unexpected) log(`${req.method} ${req.baseUrl}${req.path} failed`, err);
    res.status(status).json(body);
  };
}
