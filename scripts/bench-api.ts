// `npm run bench:api [-- --duration S] [--connections N] [--only NAME]`: the API under load on loopback. A fresh
// database with the demo data, the server as `npm start` runs it (production mode) on BENCH_PORT, and for each
// scenario (scripts/bench-api/scenarios.ts) autocannon with 50 connections for a bounded time, while a probe in
// its own thread calls /api/health every 20 ms. Prints throughput, latency p50/p99, errors, and the probe's p50,
// p99 and worst stall. Target: the probe's p99 under 100 ms during "plan + 4 PDFs". Then the repeated reads as
// ratios to /api/auth/me in the same run (scripts/bench-api/cache-reads.ts; 5 s per route, --cache-seconds N).
import { Worker } from 'node:worker_threads';
import { availableParallelism, loadavg } from 'node:os';
import { prepareDatabase, startServer, stopProcess, waitForHealth } from './lib/app-env.ts';
import { cacheReads } from './bench-api/cache-reads.ts';
import { signIn } from './bench-api/client.ts';
import { SCENARIOS, type World } from './bench-api/scenarios.ts';

function args(argv: string[]) {
  const out = { durationS: 10, connections: 50, only: [] as string[], cacheSeconds: 5 };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === '--duration') out.durationS = Number(argv[++i]);
    else if (argv[i] === '--connections') out.connections = Number(argv[++i]);
    else if (argv[i] === '--only') out.only.push(argv[++i]);
    else if (argv[i] === '--cache-seconds') out.cacheSeconds = Number(argv[++i]);
    else throw new Error(`unknown argument ${argv[i]}`);
  }
  return out;
}

const opts = args(process.argv.slice(2));
const port = Number(process.env.BENCH_PORT ?? 3990);
const base = `http://127.0.0.1:${port}`;
const db = await prepareDatabase('slotwright_bench', { fresh: true, seed: true });
const server = startServer({ ...db.env, NODE_ENV: 'production', SERVE_CLIENT: 'false', PORT: String(port), HOST: '127.0.0.1', SIGNIN_RATE_MAX: '1000' });

// Whatever ends this script, the server it started ends with it.
process.on('exit', () => server.kill('SIGTERM'));

/** Waits until work left over from the previous scenario has drained (a shop document is served again). */
async function settle(world: World): Promise<void> {
  for (let i = 0; i < 120; i++) {
    const r = await fetch(`${base}/api/frames/${world.frameId}/shop/cut-list.csv`, { headers: { cookie: world.caller.cookie } });
    await r.arrayBuffer();
    if (r.status === 200) return;
    await new Promise((res) => setTimeout(res, 1000));
  }
}

const q = (sorted: number[], f: number) => sorted[Math.min(sorted.length - 1, Math.floor(f * sorted.length))] ?? NaN;
const ms = (v: number) => `${v.toFixed(v < 10 ? 1 : 0)} ms`;

try {
  await waitForHealth(base);
  const caller = await signIn(base, 'rui@slotwright.test', 'slotwright-demo');
  const workshops = (await caller.json<{ id: string }[]>('GET', '/api/workshops')).body;
  const projects = (await caller.json<{ id: string; frameCount: number }[]>('GET', `/api/workshops/${workshops[0].id}/projects`)).body;
  const project = projects.find((p) => p.frameCount > 0) ?? projects[0];
  const detail = (await caller.json<{ frames: { id: string }[] }>('GET', `/api/projects/${project.id}`)).body;
  const frameId = detail.frames[0].id;
  const frame = (await caller.json<{ document: unknown }>('GET', `/api/frames/${frameId}`)).body;
  const saveFrames: World['saveFrames'] = [];
  for (let i = 0; i < opts.connections; i++) {
    const r = await caller.json<{ id: string; version: number }>('POST', `/api/projects/${project.id}/frames`, { name: `Bench ${i}`, document: frame.document });
    saveFrames.push({ id: r.body.id, version: r.body.version, document: frame.document });
  }
  const world: World = { caller, workshopId: workshops[0].id, projectId: project.id, frameId, saveFrames };

  console.log(`bench:api on ${availableParallelism()} cores (load average ${loadavg()[0].toFixed(2)}), ${opts.connections} connections, ${opts.durationS} s each`);
  const rows: string[][] = [['scenario', 'req', 'req/s', 'p50', 'p99', 'errors', 'non-2xx', 'health p50', 'health p99', 'worst stall', 'statuses']];
  for (const s of SCENARIOS) {
    if (opts.only.length > 0 && !opts.only.includes(s.name)) continue;
    await settle(world);
    const probe = new Worker(new URL('./bench-api/probe.mjs', import.meta.url), { workerData: { url: `${base}/api/health`, everyMs: 20 } });
    const result = await s.run(world, { connections: opts.connections, durationS: opts.durationS });
    const done = new Promise<{ latencies: number[]; failures: number }>((r, reject) => {
      probe.once('message', r);
      probe.once('error', reject);
    });
    probe.postMessage('stop');
    const health = await done;
    await probe.terminate();
    const h = health.latencies.sort((a, b) => a - b);
    rows.push([
      s.name,
      String(result.requests),
      result.throughput.toFixed(1),
      ms(result.p50),
      ms(result.p99),
      String(result.errors),
      String(result.non2xx),
      ms(q(h, 0.5)),
      ms(q(h, 0.99)),
      ms(h[h.length - 1] ?? NaN),
      Object.entries(result.statusCounts).map(([k, v]) => `${k}:${v}`).join(' ') + (health.failures ? ` (health failures ${health.failures})` : ''),
    ]);
    console.log(`  ${s.name}: ${s.what}${result.note ? ` — ${result.note}` : ''}`);
  }
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
  for (const r of rows) console.log(r.map((cell, c) => cell.padEnd(widths[c])).join('  '));
  if (opts.only.length === 0) {
    await settle(world);
    console.log(`\n${(await cacheReads(caller, project.id, opts.cacheSeconds)).join('\n')}`);
  }
} finally {
  await stopProcess(server);
}
