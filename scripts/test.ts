// `npm test`: the same set-up as `npm start` on fresh test databases, then the type-check, unit and API tests
// against real PostgreSQL, and browser tests in Debian's Chromium against the built app. Every stage runs even
// when an earlier one fails, so one run shows every failure; the exit code is non-zero if any stage failed.
// Services started here are stopped here.
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildClient, prepareDatabase, startServer, stopProcess, waitForHealth } from './lib/app-env.ts';
import { startMailFake } from './lib/mail-fake.ts';
import { projectRoot, stopCluster, type Cluster } from './lib/postgres.ts';
import { aptInstall, runAsync } from './lib/run.ts';

const outDir = join(projectRoot, 'test-output');
mkdirSync(outDir, { recursive: true });
const results: { stage: string; ok: boolean; passed?: number; failed?: number; failures?: string[] }[] = [];

type VitestJson = {
  numPassedTests: number;
  numFailedTests: number;
  testResults: { name: string; assertionResults: { status: string; fullName: string; failureMessages?: string[] }[] }[];
};

/** "file › test: first line of the message", so the summary at the end of a long log names what failed. */
function failuresOf(json: VitestJson): string[] {
  return json.testResults.flatMap((f) =>
    f.assertionResults
      .filter((a) => a.status === 'failed')
      .map((a) => {
        const first = (a.failureMessages?.[0] ?? '').split('\n')[0].slice(0, 300);
        return `${f.name.replace(`${projectRoot}/`, '')} › ${a.fullName}: ${first}`;
      }),
  );
}
const vitest = join(projectRoot, 'node_modules/vitest/vitest.mjs');

async function vitestProject(project: string, env: NodeJS.ProcessEnv): Promise<void> {
  const report = join(outDir, `vitest-${project}.json`);
  const code = await runAsync(
    process.execPath,
    [vitest, 'run', '--project', project, '--reporter=default', '--reporter=json', `--outputFile.json=${report}`],
    { env, cwd: projectRoot },
  );
  let passed: number | undefined;
  let failed: number | undefined;
  let failures: string[] | undefined;
  if (existsSync(report)) {
    const json = JSON.parse(readFileSync(report, 'utf8')) as VitestJson;
    passed = json.numPassedTests;
    failed = json.numFailedTests;
    failures = failuresOf(json);
  }
  results.push({ stage: `${project} tests`, ok: code === 0, passed, failed, failures });
}

async function stage(name: string, fn: () => Promise<void> | void): Promise<void> {
  console.log(`\n=== ${name}`);
  try {
    await fn();
  } catch (err) {
    console.error(`${name} failed: ${err instanceof Error ? err.message : String(err)}`);
    results.push({ stage: name, ok: false });
  }
}

let cluster: Cluster | undefined;
let startedCluster = false;

try {
  await stage('type-check', async () => {
    const code = await runAsync(process.execPath, [join(projectRoot, 'node_modules/vue-tsc/bin/vue-tsc.js'), '--noEmit', '-p', 'tsconfig.json'], { cwd: projectRoot });
    results.push({ stage: 'type-check', ok: code === 0 });
  });

  await stage('unit tests', () => vitestProject('unit', process.env));

  await stage('API tests', async () => {
    const db = await prepareDatabase('slotwright_test', { fresh: true, seed: false });
    cluster = db.cluster;
    startedCluster = db.startedCluster;
    await vitestProject('api', db.env);
  });

  await stage('browser tests', async () => {
    const db = await prepareDatabase('slotwright_e2e', { fresh: true, seed: true });
    cluster = db.cluster;
    startedCluster ||= db.startedCluster;
    if (!existsSync('/usr/bin/chromium')) aptInstall(['chromium']);
    buildClient();
    const port = Number(process.env.E2E_PORT ?? 3999);
    const baseUrl = `http://127.0.0.1:${port}`;
    const mail = await startMailFake(db.env, { dir: join(outDir, 'mail-fake'), port: 0 });
    const server = startServer({ ...mail.env, NODE_ENV: 'production', PORT: String(port), HOST: '127.0.0.1' });
    try {
      await waitForHealth(baseUrl);
      await vitestProject('e2e', { ...mail.env, E2E_BASE_URL: baseUrl });
    } finally {
      await stopProcess(server);
      await mail.stop();
    }
  });
} finally {
  if (startedCluster && cluster) stopCluster(cluster);
}

const passed = results.reduce((n, r) => n + (r.passed ?? 0), 0);
const failed = results.reduce((n, r) => n + (r.failed ?? 0), 0);
console.log('\n=== summary');
for (const r of results) {
  const counts = r.passed === undefined ? '' : ` (${r.passed} passed, ${r.failed} failed)`;
  console.log(`${r.ok ? 'ok  ' : 'FAIL'} ${r.stage}${counts}`);
  for (const f of r.failures ?? []) console.log(`       ✗ ${f}`);
}
const allOk = results.length > 0 && results.every((r) => r.ok);
console.log(`\nnpm test: ${passed} passed, ${failed} failed`);
process.exit(allOk ? 0 : 1);
