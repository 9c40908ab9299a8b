// `npm run bench:api:cache [-- --seconds N]`: only the repeated-reads table of `npm run bench:api`
// (scripts/bench-api/cache-reads.ts), on a fresh database of its own. Bounded: 5 s per route by default.
import { prepareDatabase, startServer, stopProcess, waitForHealth } from './lib/app-env';
import { signIn } from './bench-api/client';
import { cacheReads } from './bench-api/cache-reads';

const PORT = Number(process.env.BENCH_PORT ?? 3921);
const BASE = `http://127.0.0.1:${PORT}`;
const DEMO_PROJECT = 'Rear kitchen pod — short-wheelbase van';

async function main(): Promise<void> {
  const at = process.argv.indexOf('--seconds');
  const seconds = at > 0 ? Number(process.argv[at + 1]) : 5;
  const db = await prepareDatabase('slotwright_bench_api_cache', { fresh: true });
  const server = startServer({ ...db.env, NODE_ENV: 'production', PORT: String(PORT), HOST: '127.0.0.1', SERVE_CLIENT: 'false', LOG_LEVEL: 'warn' });
  try {
    await waitForHealth(BASE);
    const caller = await signIn(BASE, 'rui@slotwright.test', 'slotwright-demo');
    const [workshop] = (await caller.json<{ id: string }[]>('GET', '/api/workshops')).body;
    const projects = (await caller.json<{ id: string; name: string }[]>('GET', `/api/workshops/${workshop.id}/projects`)).body;
    const project = projects.find((p) => p.name === DEMO_PROJECT) ?? projects[0];
    console.log(`\n${(await cacheReads(caller, project.id, seconds)).join('\n')}`);
  } finally {
    await stopProcess(server);
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
