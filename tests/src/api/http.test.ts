import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ApiError, createHttp, type HttpOptions } from '@/api/http';

interface Call {
  url: string;
  init: RequestInit;
}

function json(status: number, body: unknown): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

/** A fetch that answers from a queue and records what was sent. */
function fakeFetch(...replies: Array<Response | Error>) {
  const calls: Call[] = [];
  const fetch = async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    calls.push({ url: String(input), init: init ?? {} });
    const reply = replies.shift();
    if (!reply) throw new Error('no reply queued');
    if (reply instanceof Error) throw reply;
    return reply;
  };
  return { fetch: fetch as typeof globalThis.fetch, calls };
}

function header(call: Call, name: string): string | undefined {
  return (call.init.headers as Record<string, string>)[name];
}

const thing = z.object({ id: z.string(), name: z.string() });

function http(fetch: typeof globalThis.fetch, extra: Partial<HttpOptions> = {}) {
  return createHttp({ fetch, csrfToken: () => 'tok-1', ...extra });
}

describe('createHttp', () => {
  it('sends JSON with same-origin credentials and parses the reply with the schema', async () => {
    const { fetch, calls } = fakeFetch(json(201, { id: 'a', name: 'Kitchen pod', extra: true }));
    const result = await http(fetch).post('/things', { name: 'Kitchen pod' }, thing);

    expect(result).toEqual({ id: 'a', name: 'Kitchen pod' });
    expect(calls[0].url).toBe('/api/things');
    expect(calls[0].init.method).toBe('POST');
    expect(calls[0].init.credentials).toBe('same-origin');
    expect(calls[0].init.body).toBe('{"name":"Kitchen pod"}');
    expect(header(calls[0], 'Content-Type')).toBe('application/json');
  });

  it('adds the CSRF header on state-changing calls only', async () => {
    const { fetch, calls } = fakeFetch(json(200, { id: 'a', name: 'x' }), json(200, { id: 'a', name: 'y' }), json(204, undefined));
    const client = http(fetch);
    await client.get('/things/a', thing);
    await client.patch('/things/a', { name: 'y' }, thing);
    await client.delete('/things/a', null);

    expect(header(calls[0], 'X-CSRF-Token')).toBeUndefined();
    expect(header(calls[1], 'X-CSRF-Token')).toBe('tok-1');
    expect(header(calls[2], 'X-CSRF-Token')).toBe('tok-1');
    expect(calls[2].init.body).toBeUndefined();
  });

  it('builds query strings and skips undefined values', async () => {
    const { fetch, calls } = fakeFetch(json(200, []));
    await http(fetch).get('/projects/p/frames', z.array(thing), { deleted: 'true', page: undefined });
    expect(calls[0].url).toBe('/api/projects/p/frames?deleted=true');
  });

  it('turns the error body into a typed ApiError with its field messages', async () => {
    const body = { error: { code: 'validation', message: 'Check the highlighted fields', fields: { name: 'Must not be empty' } } };
    const { fetch } = fakeFetch(json(400, body));
    const failure = await http(fetch).post('/things', { name: '' }, thing).catch((e: unknown) => e);

    expect(failure).toBeInstanceOf(ApiError);
    const error = failure as ApiError;
    expect(error.status).toBe(400);
    expect(error.code).toBe('validation');
    expect(error.message).toBe('Check the highlighted fields');
    expect(error.fields).toEqual({ name: 'Must not be empty' });
    expect(error.hasFieldErrors).toBe(true);
  });

  it('keeps the stored state sent with a version conflict', async () => {
    const current = { version: 4, document: { schemaVersion: 1, members: [] }, savedAt: '2025-03-01T10:00:00.000Z', savedBy: null };
    const { fetch } = fakeFetch(json(409, { error: { code: 'version_conflict', message: 'Saved by someone else', current } }));
    const error = (await http(fetch).put('/frames/f/document', {}, null).catch((e: unknown) => e)) as ApiError;
    expect(error.code).toBe('version_conflict');
    expect(error.current?.version).toBe(4);
  });

  it('tells 403 refusals apart from CSRF rejections', async () => {
    const { fetch } = fakeFetch(json(403, { error: { code: 'forbidden', message: 'Viewers cannot rename frames' } }));
    const error = (await http(fetch).patch('/frames/f', { name: 'x' }, thing).catch((e: unknown) => e)) as ApiError;
    expect(error.isForbidden).toBe(true);
    expect(new ApiError(403, 'csrf', 'bad token').isForbidden).toBe(false);
  });

  it('fetches a fresh token once and retries when the server rejects the CSRF token', async () => {
    const { fetch, calls } = fakeFetch(
      json(403, { error: { code: 'csrf', message: 'Bad token' } }),
      json(200, { id: 'a', name: 'ok' }),
    );
    let refreshed = 0;
    const result = await http(fetch, {
      refreshCsrfToken: async () => {
        refreshed += 1;
        return 'tok-2';
      },
    }).patch('/things/a', { name: 'ok' }, thing);

    expect(result.name).toBe('ok');
    expect(refreshed).toBe(1);
    expect(header(calls[1], 'X-CSRF-Token')).toBe('tok-2');
  });

  it('reports an ended session and still throws', async () => {
    const { fetch } = fakeFetch(json(401, { error: { code: 'unauthenticated', message: 'Sign in first' } }));
    const seen: string[] = [];
    const failure = await http(fetch, { onUnauthenticated: (e) => seen.push(e.code) })
      .get('/auth/me', thing)
      .catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(ApiError);
    expect(seen).toEqual(['unauthenticated']);
  });

  it('does not treat wrong credentials as an ended session', async () => {
    const { fetch } = fakeFetch(json(401, { error: { code: 'invalid_credentials', message: 'Wrong e-mail or password' } }));
    const seen: string[] = [];
    await http(fetch, { onUnauthenticated: (e) => seen.push(e.code) })
      .post('/auth/signin', {}, thing)
      .catch(() => undefined);
    expect(seen).toEqual([]);
  });

  it('gives a readable error when the reply is not JSON or the network fails', async () => {
    const { fetch } = fakeFetch(new Response('<html>Bad gateway</html>', { status: 502 }), new TypeError('Failed to fetch'));
    const client = http(fetch);
    const gateway = (await client.get('/health', thing).catch((e: unknown) => e)) as ApiError;
    expect(gateway.status).toBe(502);
    expect(gateway.message).toMatch(/not answering/);
    const offline = (await client.get('/health', thing).catch((e: unknown) => e)) as ApiError;
    expect(offline.code).toBe('network');
    expect(offline.status).toBe(0);
  });

  it('refuses a successful reply that does not match the schema, naming where', async () => {
    const { fetch } = fakeFetch(json(200, { id: 'a' }));
    const error = (await http(fetch).get('/things/a', thing).catch((e: unknown) => e)) as ApiError;
    expect(error.code).toBe('bad_response');
    expect(error.message).toContain('name');
  });
});
