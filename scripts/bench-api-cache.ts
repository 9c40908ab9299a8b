// `npm run bench:api:cache`: requests per second of the reads that repeat most, against `/api/auth/me` (a session
// check and one small query) in the same run, on loopback with autocannon, so the ratio holds however loaded the
// machine is. The frame is a generated 504-member cabinet run (a ~170 kB document). Goals (issue 13): the frame's
// GET ≥ 0.5× `/api/auth/me`, the cached saw-list PDF ≥ 0.5×. Bounded: 5 s per route (--seconds N to change).
import { loadavg } from 'node:os';
import autocannon from 'autocannon';
import { benchFrame } from './lib/bench-frame';
import { prepareDatabase, startServer, stopProcess, waitForHealth } from './lib/app-env';

const PORT = Number(process.env.BENCH_PORT ?? 3921);
const BASE = `http://127.0.0.1:${PORT}`;
const DEMO_PROJECT = 'Rear kitchen pod — short-wheelbase van';

type Session = { cookie: string; csrf: string };

async function signIn(): Promise<Session> {
  const first = await fetch(`${BASE}/api/auth/csrf`);
  const anon = (first.headers.get('set-cookie') ?? '').split(';')[0];
  const { token } = (await first.json()) as { token: string };
  const res = await fetch(`${BASE}/api/auth/signin`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Cookie: anon, 'X-CSRF-Token': token },
    body: JSON.stringify({ email: 'rui@slotwright.test', password: 'slotwright-demo' }),
  });
  if (!res.ok) throw new Error(`sign-in: ${res.status} ${await res.text()}`);
  const { csrfToken } = (await res.json()) as { csrfToken: string };
  return { cookie: (res.headers.get('set-cookie') ?? '').split(';')[0], csrf: csrfToken };
}

async function api<T>(s: Session, method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${BASE}${path}`, {
    method,
    headers: { Cookie: s.cookie, 'X-CSRF-Token': s.csrf, ...(body ? { 'Content-Type': 'application/json' } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}

type Row = { name: string; rps: number; p50: number; p99: number; errors: number; load: number; bytes: number };

async function hammer(name: string, path: string, headers: Record<string, string>, seconds: number, expect: number): Promise<Row> {
  const r = await autocannon({ url: `${BASE}${path}`, connections: 4, duration: seconds, headers });
  const wrong = r.non2xx - (expect === 304 ? r['3xx'] ?? 0 : 0);
  return { name, rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, errors: r.errors + r.timeouts + Math.max(0, wrong), load: loadavg()[0], bytes: r.throughput.average / Math.max(1, r.requests.average) };
}

async function main(): Promise<void> {
  const at = process.argv.indexOf('--seconds');
  const seconds = at > 0 ? Number(process.argv[at + 1]) : 5;
  const db = await prepareDatabase('slotwright_bench_api_cache', { fresh: true });
  const server = startServer({ ...db.env, NODE_ENV: 'production', PORT: String(PORT), HOST: '127.0.0.1', SERVE_CLIENT: 'false', LOG_LEVEL: 'warn' });
  try {
    await waitForHealth(BASE);
    const s = await signIn();
    const [workshop] = await api<{ id: string }[]>(s, 'GET', '/api/workshops');
    const projects = await api<{ id: string; name: string }[]>(s, 'GET', `/api/workshops/${workshop.id}/projects`);
    const project = projects.find((p) => p.name === DEMO_PROJECT) ?? projects[0];
    const doc = benchFrame();
    const frame = await api<{ id: string }>(s, 'POST', `/api/projects/${project.id}/frames`, { name: `Bench run ${Date.now()}`, document: doc });
    const head = await fetch(`${BASE}/api/frames/${frame.id}`, { headers: { Cookie: s.cookie } });
    const etag = head.headers.get('etag') ?? '';
    const size = (await head.text()).length;
    // The first request of each document makes it (the planner has up to its time limit); the runs measure reuse.
    for (const d of ['saw-list.pdf', 'cut-list.csv']) await fetch(`${BASE}/api/frames/${frame.id}/shop/${d}`, { headers: { Cookie: s.cookie } });

    const h = { Cookie: s.cookie };
    const rows: Row[] = [];
    rows.push(await hammer('GET /api/auth/me', '/api/auth/me', h, seconds, 200));
    rows.push(await hammer(`GET /api/frames/:id (${Math.round(size / 1000)} kB)`, `/api/frames/${frame.id}`, h, seconds, 200));
    rows.push(await hammer('GET /api/frames/:id, If-None-Match → 304', `/api/frames/${frame.id}`, { ...h, 'If-None-Match': etag }, seconds, 304));
    rows.push(await hammer('saw-list.pdf (cached)', `/api/frames/${frame.id}/shop/saw-list.pdf`, h, seconds, 200));
    rows.push(await hammer('cut-list.csv (cached)', `/api/frames/${frame.id}/shop/cut-list.csv`, h, seconds, 200));
    rows.push(await hammer('GET /api/auth/me (again)', '/api/auth/me', h, seconds, 200));

    const me = (rows[0].rps + rows[rows.length - 1].rps) / 2;
    console.log(`\nAPI reads on loopback, autocannon 4 connections × ${seconds} s each, ${doc.members.length}-member frame, ${new Date().toISOString()}`);
    console.log(`| ${'route'.padEnd(42)} |   req/s | × auth/me | p50 ms | p99 ms | kB each | errors | load  |`);
    console.log(`|${'-'.repeat(44)}|---------|-----------|--------|--------|---------|--------|-------|`);
    for (const r of rows) {
      console.log(
        `| ${r.name.padEnd(42)} | ${r.rps.toFixed(0).padStart(7)} | ${(r.rps / me).toFixed(2).padStart(9)} | ${String(r.p50).padStart(6)} | ${String(r.p99).padStart(6)} | ${(r.bytes / 1000).toFixed(1).padStart(7)} | ${String(r.errors).padStart(6)} | ${r.load.toFixed(2)} |`,
      );
    }
    const goal = (i: number) => (rows[i].rps / me >= 0.5 ? 'ok' : 'BELOW');
    console.log(`Goals: frame GET ≥ 0.5× auth/me: ${goal(1)}; cached saw-list PDF ≥ 0.5×: ${goal(3)}`);
  } finally {
    await stopProcess(server);
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
