// The reads that repeat most, as requests per second against `/api/auth/me` (a session check and one small query)
// in the same run, on loopback with autocannon, so the ratio holds however loaded the machine is. The frame is the
// generated 504-member cabinet run (a ~170 kB document). Goals (issue 13): the frame's GET ≥ 0.5× `/api/auth/me`,
// the cached saw-list PDF ≥ 0.5×. Bounded: `seconds` per route, six routes.
import { loadavg } from 'node:os';
import autocannon from 'autocannon';
import { benchFrame } from '../lib/bench-frame';
import type { Caller } from './client';

type Row = { name: string; rps: number; p50: number; p99: number; errors: number; load: number; bytes: number };

async function hammer(base: string, name: string, path: string, headers: Record<string, string>, seconds: number, expect: number): Promise<Row> {
  const r = await autocannon({ url: `${base}${path}`, connections: 4, duration: seconds, headers });
  const wrong = r.non2xx - (expect === 304 ? (r['3xx'] ?? 0) : 0);
  return { name, rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, errors: r.errors + r.timeouts + Math.max(0, wrong), load: loadavg()[0], bytes: r.throughput.average / Math.max(1, r.requests.average) };
}

/** Creates the bench frame in `projectId`, measures, and returns the table's lines (the last one the verdict). */
export async function cacheReads(caller: Caller, projectId: string, seconds: number): Promise<string[]> {
  const base = caller.base;
  const doc = benchFrame();
  const frame = await caller.json<{ id: string }>('POST', `/api/projects/${projectId}/frames`, { name: `Bench run ${Date.now()}`, document: doc });
  if (frame.status !== 201 && frame.status !== 200) throw new Error(`creating the bench frame: HTTP ${frame.status}`);
  const id = frame.body.id;
  const h = { Cookie: caller.cookie };
  const head = await fetch(`${base}/api/frames/${id}`, { headers: h });
  const etag = head.headers.get('etag') ?? '';
  const size = (await head.text()).length;
  // The first request of each document makes it (the planner has up to its time limit); the runs measure reuse.
  for (const d of ['saw-list.pdf', 'cut-list.csv']) await (await fetch(`${base}/api/frames/${id}/shop/${d}`, { headers: h })).arrayBuffer();

  const rows: Row[] = [];
  rows.push(await hammer(base, 'GET /api/auth/me', '/api/auth/me', h, seconds, 200));
  rows.push(await hammer(base, `GET /api/frames/:id (${Math.round(size / 1000)} kB)`, `/api/frames/${id}`, h, seconds, 200));
  rows.push(await hammer(base, 'GET /api/frames/:id, If-None-Match → 304', `/api/frames/${id}`, { ...h, 'If-None-Match': etag }, seconds, 304));
  rows.push(await hammer(base, 'saw-list.pdf (cached)', `/api/frames/${id}/shop/saw-list.pdf`, h, seconds, 200));
  rows.push(await hammer(base, 'cut-list.csv (cached)', `/api/frames/${id}/shop/cut-list.csv`, h, seconds, 200));
  rows.push(await hammer(base, 'GET /api/auth/me (again)', '/api/auth/me', h, seconds, 200));

  const me = (rows[0].rps + rows[rows.length - 1].rps) / 2;
  const out = [
    `Repeated reads, autocannon 4 connections × ${seconds} s each, ${doc.members.length}-member frame, ${new Date().toISOString()}`,
    `| ${'route'.padEnd(42)} |   req/s | × auth/me | p50 ms | p99 ms | kB each | errors | load  |`,
    `|${'-'.repeat(44)}|---------|-----------|--------|--------|---------|--------|-------|`,
  ];
  for (const r of rows) {
    out.push(
      `| ${r.name.padEnd(42)} | ${r.rps.toFixed(0).padStart(7)} | ${(r.rps / me).toFixed(2).padStart(9)} | ${String(r.p50).padStart(6)} | ${String(r.p99).padStart(6)} | ${(r.bytes / 1000).toFixed(1).padStart(7)} | ${String(r.errors).padStart(6)} | ${r.load.toFixed(2)} |`,
    );
  }
  const goal = (i: number) => (rows[i].rps / me >= 0.5 ? 'ok' : 'BELOW');
  out.push(`Goals: frame GET ≥ 0.5× auth/me: ${goal(1)}; cached saw-list PDF ≥ 0.5×: ${goal(3)}`);
  return out;
}
