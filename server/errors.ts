import type { ErrorCode, VersionConflictCurrent } from '@shared/api/errors';
import { ERROR_STATUS } from '@shared/api/errors';

// Typed errors thrown anywhere in the server; the one error middleware turns them into
// `{ error: { code, message, fields? } }` with the status that belongs to the code.

export class HttpError extends Error {
  readonly status: number;
  /** Seconds a client should wait before trying again (sent as Retry-After with 429 and 503). */
  retryAfterS?: number;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'HttpError';
    this.status = ERROR_STATUS[code];
  }
}

export class ValidationError extends HttpError {
  constructor(fields: Record<string, string>, message = 'The request has invalid fields') {
    super('validation', message, fields);
  }
}

export class UnauthenticatedError extends HttpError {
  constructor(message = 'Sign in first') {
    super('unauthenticated', message);
  }
}

export class ForbiddenError extends HttpError {
  constructor(message = 'Your role in this workshop does not allow that') {
    super('forbidden', message);
  }
}

export class NotFoundError extends HttpError {
  constructor(what: string, fields?: Record<string, string>) {
    super('not_found', `${what} not found`, fields);
  }
}

export class ConflictError extends HttpError {
  constructor(message: string, fields?: Record<string, string>) {
    super('conflict', message, fields);
  }
}

export class UnprocessableError extends HttpError {
  constructor(message: string, fields?: Record<string, string>) {
    super('unprocessable', message, fields);
  }
}

export class VersionConflictError extends HttpError {
  constructor(readonly current: VersionConflictCurrent) {
    super(
      'version_conflict',
      `The frame was saved by someone else since you opened it (now at version ${current.version}); nothing was overwritten`,
    );
  }
}
