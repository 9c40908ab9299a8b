// A signed-in caller for the benchmark: the session cookie and the CSRF token, as the browser holds them.

export interface Caller {
  base: string;
  cookie: string;
  csrf: string;
  json<T>(method: string, path: string, body?: unknown): Promise<{ status: number; body: T }>;
}

function cookieOf(res: Response, previous: string): string {
  const set = res.headers.getSetCookie?.() ?? [];
  return set.length > 0 ? set.map((c) => c.split(';')[0]).join('; ') : previous;
}

export async function signIn(base: string, email: string, password: string): Promise<Caller> {
  let res = await fetch(`${base}/api/auth/csrf`);
  let cookie = cookieOf(res, '');
  const { token } = (await res.json()) as { token: string };
  res = await fetch(`${base}/api/auth/signin`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie, 'x-csrf-token': token },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`sign-in as ${email}: HTTP ${res.status}`);
  cookie = cookieOf(res, cookie);
  const { csrfToken } = (await res.json()) as { csrfToken: string };
  const caller: Caller = {
    base,
    cookie,
    csrf: csrfToken,
    async json<T>(method: string, path: string, body?: unknown) {
      const r = await fetch(`${base}${path}`, {
        method,
        headers: { 'content-type': 'application/json', cookie: caller.cookie, 'x-csrf-token': caller.csrf },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      const text = await r.text();
      return { status: r.status, body: (text ? JSON.parse(text) : null) as T };
    },
  };
  return caller;
}
