import request from 'supertest';
import type { Express } from 'express';
import type { Response, Test } from 'supertest';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/**
 * A browser-like caller: keeps its cookies and sends the CSRF token it was given on every request.
 * `csrf` is public so tests can drop or corrupt it.
 */
export class ApiClient {
  readonly agent: ReturnType<typeof request.agent>;
  csrf: string | null = null;

  constructor(readonly app: Express) {
    this.agent = request.agent(app);
  }

  async fetchCsrf(): Promise<string> {
    const res = await this.agent.get('/api/auth/csrf').expect(200);
    this.csrf = (res.body as { token: string }).token;
    return this.csrf;
  }

  send(method: Method, url: string, body?: unknown): Test {
    let req = this.agent[method](url);
    if (this.csrf) req = req.set('X-CSRF-Token', this.csrf);
    if (body !== undefined) req = req.send(body as object);
    return req;
  }

  get(url: string) {
    return this.send('get', url);
  }
  post(url: string, body?: unknown) {
    return this.send('post', url, body);
  }
  put(url: string, body?: unknown) {
    return this.send('put', url, body);
  }
  patch(url: string, body?: unknown) {
    return this.send('patch', url, body);
  }
  delete(url: string) {
    return this.send('delete', url);
  }

  /** Signs in (fetching an anonymous CSRF token first, as the client does) and keeps the rotated token. */
  async signIn(email: string, password: string): Promise<Response> {
    await this.fetchCsrf();
    const res = await this.post('/api/auth/signin', { email, password });
    if (res.status === 200) this.csrf = (res.body as { csrfToken: string }).csrfToken;
    return res;
  }
}

export async function signedIn(app: Express, user: { email: string; password: string }): Promise<ApiClient> {
  const client = new ApiClient(app);
  const res = await client.signIn(user.email, user.password);
  if (res.status !== 200) throw new Error(`sign-in as ${user.email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return client;
}

/** The session cookie (name=value) a response set, for replaying it from another app instance. */
export function sessionCookie(res: Response): string {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  const cookie = raw?.find((c) => c.startsWith('slotwright.sid='));
  if (!cookie) throw new Error('no session cookie in the response');
  return cookie.split(';')[0];
}
