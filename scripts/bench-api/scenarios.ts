// The benchmark's scenarios, one list so more can be added: each says what autocannon sends (or what it runs by
// hand) against a server with the demo data, signed in as the demo designer.
import autocannon from 'autocannon';
import type { Caller } from './client';

export interface World {
  caller: Caller;
  workshopId: string;
  projectId: string;
  frameId: string;
  /** Frames made for the save scenario, one per connection, so saves race only with themselves. */
  saveFrames: { id: string; version: number; document: unknown }[];
}

export interface ScenarioResult {
  requests: number;
  throughput: number;
  p50: number;
  p99: number;
  errors: number;
  non2xx: number;
  statusCounts: Record<string, number>;
  note?: string;
}

export interface Scenario {
  name: string;
  /** What it shows, printed beside the figures. */
  what: string;
  run(world: World, opts: { connections: number; durationS: number }): Promise<ScenarioResult>;
}

function headers(world: World, extra: Record<string, string> = {}): Record<string, string> {
  return { cookie: world.caller.cookie, 'x-csrf-token': world.caller.csrf, 'content-type': 'application/json', ...extra };
}

async function cannon(opts: autocannon.Options): Promise<ScenarioResult> {
  const r = await autocannon({ ...opts, timeout: 30 });
  const statusCounts: Record<string, number> = {};
  for (const [k, v] of Object.entries(r.statusCodeStats ?? {})) statusCounts[k] = (v as { count: number }).count;
  return {
    requests: r.requests.total,
    throughput: r.requests.average,
    p50: r.latency.p50,
    p99: r.latency.p99,
    errors: r.errors + r.timeouts,
    non2xx: r.non2xx,
    statusCounts,
  };
}

export const SCENARIOS: Scenario[] = [
  {
    name: 'reads',
    what: 'GET a frame and its project, alternately',
    run: (w, o) =>
      cannon({
        url: w.caller.base,
        connections: o.connections,
        duration: o.durationS,
        requests: [
          { method: 'GET', path: `/api/frames/${w.frameId}`, headers: headers(w) },
          { method: 'GET', path: `/api/projects/${w.projectId}`, headers: headers(w) },
        ],
      }),
  },
  {
    name: 'saves',
    what: 'PUT a frame document on its current version (each connection its own frame: every save is a new version)',
    run: (w, o) => {
      let next = 0;
      return cannon({
        url: w.caller.base,
        connections: o.connections,
        duration: o.durationS,
        requests: [
          {
            method: 'PUT',
            headers: headers(w),
            setupRequest: (req, ctx) => {
              const context = ctx as { frame?: World['saveFrames'][number] };
              if (context.frame === undefined) context.frame = w.saveFrames[next++ % w.saveFrames.length];
              const f = context.frame;
              return { ...req, path: `/api/frames/${f.id}/document`, body: JSON.stringify({ baseVersion: f.version, document: f.document }) };
            },
            onResponse: (status, body, ctx) => {
              const context = ctx as { frame?: World['saveFrames'][number] };
              // A 409 (a connection re-made after a timeout picks a frame another one saves) names the version now.
              if (status === 409 && context.frame) context.frame.version = (JSON.parse(body) as { error: { current: { version: number } } }).error.current.version;
              if (status === 200 && context.frame) context.frame.version = (JSON.parse(body) as { version: number }).version;
            },
          },
        ],
      });
    },
  },
  {
    name: 'shop documents',
    what: 'GET the cut-list CSV and the drill-list, pick-list and saw-list PDFs in turn (past the worker queue: 503)',
    run: (w, o) =>
      cannon({
        url: w.caller.base,
        connections: o.connections,
        duration: o.durationS,
        requests: ['cut-list.csv', 'drill-list.pdf', 'pick-list.pdf', 'saw-list.pdf'].map((d) => ({
          method: 'GET' as const,
          path: `/api/frames/${w.frameId}/shop/${d}`,
          headers: headers(w),
        })),
      }),
  },
  {
    name: 'plan + 4 PDFs',
    what: 'one 5 s stock plan (2,500 pieces) and four saw-list PDFs (none cached) at once, three times over',
    async run(w) {
      const lat: number[] = [];
      const statusCounts: Record<string, number> = {};
      const job = hardJob();
      const t0 = performance.now();
      for (let round = 0; round < 3; round++) {
        const timed = async (fn: () => Promise<{ status: number }>) => {
          const s = performance.now();
          const { status } = await fn();
          lat.push(performance.now() - s);
          statusCounts[status] = (statusCounts[status] ?? 0) + 1;
        };
        await Promise.all([
          timed(() => w.caller.json('POST', '/api/plan/cut', { job, timeLimitMs: 5000 })),
          // Each PDF with its own trim, so none is served from the document cache: four are really made.
          ...Array.from({ length: 4 }, (_, i) =>
            timed(async () => {
              const r = await fetch(`${w.caller.base}/api/frames/${w.frameId}/shop/saw-list.pdf?trim_mm=${5 + round * 4 + i}`, { headers: headers(w) });
              await r.arrayBuffer();
              return r;
            }),
          ),
        ]);
      }
      const elapsedS = (performance.now() - t0) / 1000;
      lat.sort((a, b) => a - b);
      const ok = Object.entries(statusCounts).reduce((n, [k, v]) => n + (k.startsWith('2') ? v : 0), 0);
      return {
        requests: lat.length,
        throughput: lat.length / elapsedS,
        p50: lat[Math.floor(lat.length / 2)],
        p99: lat[lat.length - 1],
        errors: 0,
        non2xx: lat.length - ok,
        statusCounts,
        note: `plan wall time up to ${Math.round(lat[lat.length - 1])} ms`,
      };
    },
  },
];

/** A list that does not close its gap quickly, so the planner uses its whole time limit (invented, seeded). */
function hardJob() {
  let seed = 12345;
  const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
  const parts = Array.from({ length: 250 }, (_, i) => ({ length: Math.round(1000 + rnd() * 1900), qty: 10, label: `P${i}` }));
  return { kerf: 3, trim: 10, minOffcut: 150, stock: [{ length: 6000 }], parts };
}
