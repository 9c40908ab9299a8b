import type { ErrorRequestHandler } from 'express';
import type { ApiErrorBody } from '@shared/api/errors';
import { InputError } from '@shared/errors';
import { HttpError, VersionConflictError } from '../errors';

export type ErrorLogger = (message: string, err: unknown) => void;

interface BodyParserError {
  type: string;
  status?: number;
}

function isBodyParserError(err: unknown): err is BodyParserError {
  return typeof err === 'object' && err !== null && typeof (err as { type?: unknown }).type === 'string' && 'status' in err;
}

/** Maps an error to status + JSON body. Unknown errors become a bare 500: no message or stack leaves the server. */
export function toErrorResponse(err: unknown): { status: number; body: ApiErrorBody; unexpected: boolean } {
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
  if (isBodyParserError(err)) {
    if (err.type === 'entity.too.large') {
      return { status: 413, body: { error: { code: 'payload_too_large', message: 'The request body is too large' } }, unexpected: false };
    }
    if (err.type === 'entity.parse.failed') {
      return { status: 400, body: { error: { code: 'bad_request', message: 'The request body is not valid JSON' } }, unexpected: false };
    }
    if (err.status && err.status >= 400 && err.status < 500) {
      return { status: err.status === 415 ? 415 : 400, body: { error: { code: 'bad_request', message: 'The request body could not be read' } }, unexpected: false };
    }
  }
  return { status: 500, body: { error: { code: 'internal', message: 'Something went wrong on the server' } }, unexpected: true };
}

export function errorHandler(log: ErrorLogger): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) return next(err);
    const { status, body, unexpected } = toErrorResponse(err);
    if (unexpected) log(`${req.method} ${req.originalUrl} failed`, err);
    res.status(status).json(body);
  };
}
