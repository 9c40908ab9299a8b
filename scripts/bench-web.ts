// `npm run bench:web`: how much JavaScript each page makes the browser fetch on a first visit (nothing cached),
// measured in headless Chromium against the built app: the sign-in page, and the frame editor opened by its
// address. For each page: the scripts fetched (workers included), their size as built, as gzip (the copy the
// build makes, level 9) and as actually sent (the server prefers brotli). Budgets (issue 13): sign-in ≤ 250 kB of
// JavaScript gzip, the editor ≤ 600 kB. Flags: --no-build reuses dist/.
import { existsSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium, type BrowserContext, type Response } from 'playwright-core';
import { buildClient, prepareDatabase, startServer, stopProcess, waitForHealth } from './lib/app-env';
import { projectRoot } from './lib/postgres';

const PORT = Number(process.env.BENCH_PORT ?? 3921);
const BASE = `http://127.0.0.1:${PORT}`;
const DIST = join(projectRoot, 'dist');
const DEMO_PROJECT = 'Rear kitchen pod — short-wheelbase van';

type Fetched = { url: string; type: string; raw: number; gzip: number; wire: number; encoding: string };

/** Size of the build's gzip copy of a file (or of gzip at level 9 when the build made none). */
function gzipSize(file: string): number {
  if (existsSync(`${file}.gz`)) return statSync(`${file}.gz`).size;
  return gzipSync(readFileSync(file), { level: 9 }).length;
}

async function record(context: BrowserContext, visit: () => Promise<void>): Promise<Fetched[]> {
  const seen: Promise<Fetched | null>[] = [];
  const onResponse = (r: Response) => {
    seen.push(
      (async () => {
        const url = new URL(r.url());
        if (url.origin !== BASE || url.pathname.startsWith('/api/')) return null;
        const file = join(DIST, decodeURIComponent(url.pathname === '/' ? '/index.html' : url.pathname));
        if (!existsSync(file) || statSync(file).isDirectory()) return null;
        const sizes = await r.request().sizes().catch(() => null);
        const encoding = (await r.headerValue('content-encoding')) ?? 'none';
        const raw = statSync(file).size;
        // A Web Worker's script is fetched outside the page, and the browser reports no body size for it: the
        // server sends the build's precompressed copy as it is, so that copy's size is what went over the wire.
        const copy = encoding === 'br' ? `${file}.br` : encoding === 'gzip' ? `${file}.gz` : file;
        const wire = sizes?.responseBodySize || (existsSync(copy) ? statSync(copy).size : raw);
        return { url: url.pathname, type: r.request().resourceType(), raw, gzip: gzipSize(file), wire, encoding };
      })(),
    );
  };
  context.on('response', onResponse);
  await visit();
  context.off('response', onResponse);
  return (await Promise.all(seen)).filter((x): x is Fetched => x !== null);
}

const kB = (b: number) => `${(b / 1000).toFixed(1)} kB`.padStart(10);
const isScript = (f: Fetched) => f.url.endsWith('.js') || f.url.endsWith('.mjs');

function summary(name: string, files: Fetched[], budget: number): string[] {
  const js = files.filter(isScript);
  const sum = (k: 'raw' | 'gzip' | 'wire', list = js) => list.reduce((n, f) => n + f[k], 0);
  const gz = sum('gzip');
  const encodings = [...new Set(js.map((f) => f.encoding))].join(', ');
  return [
    `| ${name.padEnd(30)} | ${String(js.length).padStart(3)} | ${kB(sum('raw'))} | ${kB(gz)} | ${kB(sum('wire'))} (${encodings}) | ${kB(sum('wire', files))} | ≤ ${budget} kB: ${gz <= budget * 1000 ? 'ok' : 'OVER'} |`,
  ];
}

async function main(): Promise<void> {
  if (!process.argv.includes('--no-build')) {
    console.log('Building the client...');
    buildClient();
  }
  const db = await prepareDatabase('slotwright_bench_web', { fresh: true });
  const server = startServer({ ...db.env, NODE_ENV: 'production', PORT: String(PORT), HOST: '127.0.0.1', SERVE_CLIENT: 'true' });
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'],
  });
  try {
    await waitForHealth(BASE);
    // The sign-in page, on a first visit.
    const first = await browser.newContext({ baseURL: BASE, viewport: { width: 1600, height: 1000 } });
    const page = await first.newPage();
    const signIn = await record(first, async () => {
      await page.goto('/sign-in', { waitUntil: 'networkidle' });
      await page.getByLabel('E-mail').waitFor();
    });
    await page.getByLabel('E-mail').fill('rui@slotwright.test');
    await page.getByLabel('Password', { exact: true }).fill('slotwright-demo');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]+$/);
    const path = (await page.evaluate(`(async () => {
      const get = (u) => fetch(u, { credentials: 'same-origin' }).then((r) => r.json());
      const [w] = await get('/api/workshops');
      const projects = await get('/api/workshops/' + w.id + '/projects');
      const p = projects.find((x) => x.name === ${JSON.stringify(DEMO_PROJECT)}) ?? projects[0];
      const [f] = await get('/api/projects/' + p.id + '/frames');
      return '/w/' + w.id + '/projects/' + p.id + '/frames/' + f.id;
    })()`)) as string;

    // The editor opened by its address in a fresh browser (signed in, nothing cached).
    const second = await browser.newContext({ baseURL: BASE, viewport: { width: 1600, height: 1000 }, storageState: await first.storageState() });
    const editorPage = await second.newPage();
    const editor = await record(second, async () => {
      await editorPage.goto(path, { waitUntil: 'networkidle' });
      await editorPage.getByTestId('frame-editor').waitFor();
      await editorPage.waitForTimeout(1500);
    });

    console.log(`\nJavaScript fetched on a first visit (headless Chromium ${browser.version()}, ${new Date().toISOString()})`);
    console.log(`| ${'page'.padEnd(30)} | js  |   as built |       gzip | sent (encoding)             | all files sent | budget (gzip JS) |`);
    console.log(`|${'-'.repeat(32)}|-----|------------|------------|-----------------------------|----------------|------------------|`);
    console.log(summary('sign-in', signIn, 250).join('\n'));
    console.log(summary('frame editor (opened directly)', editor, 600).join('\n'));
    const biggest = editor.filter(isScript).sort((a, b) => b.gzip - a.gzip).slice(0, 8);
    console.log(`\nLargest scripts of the editor (gzip, as sent): ${biggest.map((f) => `${f.url.replace('/assets/', '')} ${kB(f.gzip).trim()}, ${kB(f.wire).trim()} ${f.encoding}`).join('; ')}`);
    const signInNames = signIn.filter(isScript).map((f) => f.url.replace('/assets/', '').replace(/-[\w-]{8}\.js$/, ''));
    console.log(`Sign-in scripts: ${signInNames.join(', ')}`);
  } finally {
    await browser.close();
    await stopProcess(server);
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
