import type { z } from 'zod';
import { apiErrorSchema, CSRF_HEADER, type VersionConflictCurrent } from '@shared/api';

/** Codes the client adds to the server's own (`shared/api/errors.ts`) for failures that never got a JSON reply. */
export type ClientErrorCode = 'network' | 'bad_response';

/** Every failed call, whatever went wrong, arrives as one of these. */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    /** Request field path (zod issue path joined with '.') → message, for showing beside form fields. */
    readonly fields: Readonly<Record<string, string>> = {},
    /** Sent with 409 version_conflict: what is stored now. */
    readonly current?: VersionConflictCurrent,
  ) {
    super(message);
  }

  get isForbidden(): boolean {
    return this.status === 403 && this.code !== 'csrf';
  }

  get isNotFound(): boolean {
    return this.status === 404;
  }

  get hasFieldErrors(): boolean {
    return Object.keys(this.fields).length > 0;
  }
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

/** A sentence fit to show a person, for any thrown value. */
export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (error instanceof Error && error.message) return error.message;
  return 'Something went wrong.';
}

// Used when the reply carried no usable `{ error }` body (a proxy page, an empty body, a dropped connection).
const FALLBACK_MESSAGES: Readonly<Record<number, string>> = {
  400: 'The request was not accepted.',
  401: 'Please sign in again.',
  403: 'You do not have permission to do that.',
  404: 'Not found. It may have been deleted or moved.',
  409: 'Someone else changed this in the meantime.',
  413: 'That is too large to send.',
  422: 'The server could not accept that.',
  429: 'Too many attempts. Wait a few minutes and try again.',
  500: 'The server ran into a problem. Try again in a moment.',
  502: 'The server is not answering. Try again in a moment.',
  503: 'The server is not ready. Try again in a moment.',
  504: 'The server took too long to answer. Try again in a moment.',
};

function fallbackMessage(status: number): string {
  return FALLBACK_MESSAGES[status] ?? `The server answered with status ${status}.`;
}

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
export type Query = Record<string, string | number | boolean | undefined>;

export interface HttpOptions {
  /** Prefix of every path; '/api' in the app. */
  baseUrl?: string;
  fetch?: typeof globalThis.fetch;
  /** The synchronizer token to send on state-changing calls, or null when there is none yet. */
  csrfToken: () => string | null;
  /** Asked once when the server refuses a token (code 'csrf'); the call is then retried with the new token. */
  refreshCsrfToken?: () => Promise<string | null>;
  /** Told about every 401 'unauthenticated' (the session ended on the server). */
  onUnauthenticated?: (error: ApiError) => void;
}

export interface RequestOptions<S extends z.ZodType | null> {
  body?: unknown;
  query?: Query;
  /** Parses the reply; null when the reply body is not read (204 or not needed). */
  schema: S;
}

type Reply<S extends z.ZodType | null> = S extends z.ZodType ? z.output<S> : void;

export interface Http {
  request<S extends z.ZodType | null>(method: HttpMethod, path: string, options: RequestOptions<S>): Promise<Reply<S>>;
  get<S extends z.ZodType>(path: string, schema: S, query?: Query): Promise<z.output<S>>;
  post<S extends z.ZodType | null>(path: string, body: unknown, schema: S): Promise<Reply<S>>;
  put<S extends z.ZodType | null>(path: string, body: unknown, schema: S): Promise<Reply<S>>;
  patch<S extends z.ZodType | null>(path: string, body: unknown, schema: S): Promise<Reply<S>>;
  delete<S extends z.ZodType | null>(path: string, schema: S): Promise<Reply<S>>;
}

const STATE_CHANGING: ReadonlySet<HttpMethod> = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

function buildUrl(baseUrl: string, path: string, query?: Query): string {
  let url = baseUrl + path;
  if (query) {
    const params = new URLSearchParams();
    for (const [key, value] of Object.entries(query)) if (value !== undefined) params.set(key, String(value));
    const text = params.toString();
    if (text) url += `?${text}`;
  }
  return url;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

/** Turns a non-2xx reply into an ApiError, trusting the server's `{ error }` body when it has one. */
export async function errorFromResponse(response: Response): Promise<ApiError> {
  const parsed = apiErrorSchema.safeParse(await readJson(response));
  if (!parsed.success) return new ApiError(response.status, `http_${response.status}`, fallbackMessage(response.status));
  const { code, message, fields, current } = parsed.data.error;
  return new ApiError(response.status, code, message || fallbackMessage(response.status), fields ?? {}, current);
}

/**
 * The one fetch wrapper: JSON in and out, same-origin cookies, the CSRF header on state-changing calls, every
 * failure as an ApiError, and every reply checked against its shared zod schema.
 */
export function createHttp(options: HttpOptions): Http {
  const baseUrl = options.baseUrl ?? '/api';
  const doFetch = options.fetch ?? ((input: RequestInfo | URL, init?: RequestInit) => globalThis.fetch(input, init));

  async function send(method: HttpMethod, url: string, body: unknown, token: string | null): Promise<Response> {
    const headers: Record<string, string> = { Accept: 'application/json' };
    if (body !== undefined) headers['Content-Type'] = 'application/json';
    if (STATE_CHANGING.has(method) && token) headers[CSRF_HEADER] = token;
    try {
      return await doFetch(url, {
        method,
        headers,
        credentials: 'same-origin',
        body: body === undefined ? undefined : JSON.stringify(body),
      });
    } catch {
      throw new ApiError(0, 'network', 'Cannot reach the server. Check the connection and try again.');
    }
  }

  async function request<S extends z.ZodType | null>(
    method: HttpMethod,
    path: string,
    { body, query, schema }: RequestOptions<S>,
  ): Promise<Reply<S>> {
    const url = buildUrl(baseUrl, path, query);
    let response = await send(method, url, body, options.csrfToken());
    let error = response.ok ? null : await errorFromResponse(response);

    // A token can go stale (server restart, session regenerated in another tab): fetch a fresh one and retry once.
    if (error?.code === 'csrf' && options.refreshCsrfToken) {
      const fresh = await options.refreshCsrfToken();
      if (fresh) {
        response = await send(method, url, body, fresh);
        error = response.ok ? null : await errorFromResponse(response);
      }
    }

    if (error) {
      if (error.status === 401 && error.code === 'unauthenticated') options.onUnauthenticated?.(error);
      throw error;
    }
    if (schema === null) return undefined as Reply<S>;

    const parsed = schema.safeParse(await readJson(response));
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const where = issue && issue.path.length ? ` (at ${issue.path.join('.')})` : '';
      throw new ApiError(response.status, 'bad_response', `The server sent a reply this page does not understand${where}.`);
    }
    return parsed.data as Reply<S>;
  }

  return {
    request,
    get: <S extends z.ZodType>(path: string, schema: S, query?: Query) =>
      request('GET', path, { schema, query }) as Promise<z.output<S>>,
    post: (path, body, schema) => request('POST', path, { body, schema }),
    put: (path, body, schema) => request('PUT', path, { body, schema }),
    patch: (path, body, schema) => request('PATCH', path, { body, schema }),
    delete: (path, schema) => request('DELETE', path, { schema }),
  };
}
