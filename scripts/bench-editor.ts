// `npm run bench:editor`: how smoothly the frame editor draws while a 500-member frame is dragged, measured in
// headless Chromium from requestAnimationFrame timestamps in the page. Builds the client, starts the app on a
// fresh bench database, opens a generated 504-member cabinet run, then drags: one upright, the whole frame
// (every member selected), and the view (pan). Target: 60 frames per second (median frame ≤ 16.7 ms).
// Bounded: three drags of ~2 s each. Flags: --no-build reuses dist/.
import { chromium, type Page } from 'playwright-core';
import { projectBox, VIEWS } from '@shared/editing/views';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun, type CabinetBay } from '@shared/model/cabinet-run';
import type { FrameDocument } from '@shared/model/frame-document';
import { buildClient, prepareDatabase, startServer, stopProcess, waitForHealth } from './lib/app-env';
import { quantile } from './lib/stats';

const PORT = Number(process.env.BENCH_PORT ?? 3921);
const BASE = `http://127.0.0.1:${PORT}`;
const DATABASE = 'slotwright_bench_editor';
const STEPS = 120;
const STEP_PX = 3;
/** Pause between pointer moves: about one display frame, as a hand on a mouse delivers them. */
const MOVE_EVERY_MS = 16;
const DEMO_PROJECT = 'Rear kitchen pod — short-wheelbase van';

/** A long cabinet run: 50 bays alternating base modules and side-rail drawers, 10 members a bay (+4). */
function benchFrame(bays = 50): FrameDocument {
  const list: CabinetBay[] = [];
  for (let k = 0; k < bays; k++) {
    const base = k % 2 === 0;
    list.push({
      id: `bay-${k}`,
      module: {
        id: `module-${k}`,
        name: base ? `Cooler ${k}` : `Drawers ${k}`,
        kind: base ? 'appliance' : 'drawer-stack',
        bearing: base ? 'base' : 'side-rails',
        size: { w_mm: 300 + ((k * 37) % 200), d_mm: 400, h_mm: base ? 420 : 300 },
        mass_kg: base ? 15 : 8,
        contents_kg: base ? 15 : 10,
        raise_mm: base ? 0 : 100,
      },
    });
  }
  return buildCabinetRun({ name: 'Bench run', profile: '40x40-s8', depth_mm: 600, height_mm: 900, seat_mm: 120, clearance_mm: 10, bays: list });
}

type FrameStats = { frames: number; median: number; p95: number; worst: number; over20: number };

function stats(stamps: number[]): FrameStats {
  const d = stamps.slice(1).map((t, i) => t - stamps[i]).sort((a, b) => a - b);
  return { frames: d.length, median: quantile(d, 0.5), p95: quantile(d, 0.95), worst: d[d.length - 1] ?? NaN, over20: d.filter((x) => x > 20).length };
}

async function recordFrames(page: Page, gesture: () => Promise<void>): Promise<FrameStats> {
  // Passed as text: the page must not see helpers the TypeScript loader adds to named functions.
  await page.evaluate(`(() => {
    window.__frames = [];
    window.__recording = true;
    requestAnimationFrame(function loop(t) {
      window.__frames.push(t);
      if (window.__recording) requestAnimationFrame(loop);
    });
  })()`);
  await gesture();
  const stamps = (await page.evaluate('(() => { window.__recording = false; return window.__frames; })()')) as number[];
  return stats(stamps);
}

async function drag(page: Page, x: number, y: number, button: 'left' | 'middle' = 'left'): Promise<void> {
  await page.mouse.move(x, y);
  await page.mouse.down({ button });
  for (let k = 1; k <= STEPS; k++) {
    // Out, then half way back, so the drag stays on screen and still ends somewhere new.
    const half = STEPS / 2;
    const dx = (k <= half ? k : half - (k - half) / 2) * STEP_PX;
    await page.mouse.move(x + dx, y + dx / 3);
    await page.waitForTimeout(MOVE_EVERY_MS);
  }
  await page.mouse.up({ button });
}

/** Signs in, creates the bench frame in the demo project through the API, opens it in the editor. */
async function openBenchFrame(page: Page, doc: FrameDocument): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('rui@slotwright.test');
  await page.getByLabel('Password', { exact: true }).fill('slotwright-demo');
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL(/\/w\/[0-9a-f-]+$/);
  const script = `(async () => {
    const get = (url, init) => fetch(url, { credentials: 'same-origin', ...init }).then(async (r) => {
      if (!r.ok) throw new Error((init?.method ?? 'GET') + ' ' + url + ': ' + r.status + ' ' + (await r.text()));
      return r.json();
    });
    const { token } = await get('/api/auth/csrf');
    const [workshop] = await get('/api/workshops');
    const projects = await get('/api/workshops/' + workshop.id + '/projects');
    const p = projects.find((x) => x.name === ${JSON.stringify(DEMO_PROJECT)}) ?? projects[0];
    const frame = await get('/api/projects/' + p.id + '/frames', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token },
      body: JSON.stringify({ name: 'Bench run ' + Date.now(), document: ${JSON.stringify(doc)} }),
    });
    return '/w/' + workshop.id + '/projects/' + p.id + '/frames/' + frame.id;
  })()`;
  const path = (await page.evaluate(script)) as string;
  await page.goto(path);
  await page.getByTestId('frame-editor').waitFor();
  await page.waitForTimeout(1500);
}

/** Screen position of a member's middle in the main (front) view, from the camera the canvas publishes. */
async function memberOnScreen(page: Page, doc: FrameDocument, id: string): Promise<{ x: number; y: number }> {
  const report = computeReport(doc);
  const m = report.members.find((x) => x.id === id);
  if (!m) throw new Error(`no member ${id}`);
  const r = projectBox(VIEWS.front, { min: [m.min_mm.x, m.min_mm.y, m.min_mm.z], max: [m.max_mm.x, m.max_mm.y, m.max_mm.z] });
  const canvas = page.locator('[data-view="front"]');
  const box = await canvas.boundingBox();
  const [scale, ox, oy] = ((await canvas.getAttribute('data-camera')) ?? '1 0 0').split(' ').map(Number);
  if (!box) throw new Error('the front view is not on screen');
  return { x: box.x + ox + ((r.x0 + r.x1) / 2) * scale, y: box.y + oy - ((r.y0 + r.y1) / 2) * scale };
}

function line(name: string, s: FrameStats): string {
  const fps = 1000 / s.median;
  return (
    `${name.padEnd(26)} ${String(s.frames).padStart(4)} frames  median ${s.median.toFixed(1)} ms (${fps.toFixed(0)} fps)  ` +
    `p95 ${s.p95.toFixed(1)} ms  worst ${s.worst.toFixed(1)} ms  frames over 20 ms: ${s.over20}`
  );
}

async function main(): Promise<void> {
  const build = !process.argv.includes('--no-build');
  const db = await prepareDatabase(DATABASE, { fresh: true });
  if (build) {
    console.log('Building the client...');
    buildClient();
  }
  const server = startServer({ ...db.env, NODE_ENV: 'production', PORT: String(PORT), HOST: '127.0.0.1', SERVE_CLIENT: 'true' });
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'],
  });
  try {
    await waitForHealth(BASE);
    const page = await browser.newPage({ viewport: { width: 1600, height: 1000 }, baseURL: BASE });
    page.setDefaultTimeout(30_000);
    const doc = benchFrame();
    await openBenchFrame(page, doc);
    const engine = (await page.locator('.frame-editor__status').innerText()).replace(/\s+/g, ' ');

    // The upright in the middle of the run, picked and dragged.
    const upright = await memberOnScreen(page, doc, 'run-u25-f');
    await page.mouse.click(upright.x, upright.y);
    const one = await recordFrames(page, () => drag(page, upright.x, upright.y));
    const afterOne = (await page.locator('.frame-editor__status').innerText()).replace(/\s+/g, ' ');
    await page.keyboard.press('Control+z');

    // Every member selected, dragged together.
    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('Control+a');
    const all = await recordFrames(page, () => drag(page, upright.x, upright.y));
    await page.keyboard.press('Control+z');
    await page.keyboard.press('Escape');

    // Panning redraws the whole frame on every move.
    const pan = await recordFrames(page, () => drag(page, upright.x, upright.y + 150, 'middle'));

    console.log(`\nFrame editor, ${doc.members.length} members, ${doc.modules.length} modules, headless Chromium ${browser.version()}`);
    console.log(`On opening: ${engine}`);
    console.log(line('Drag one upright', one));
    console.log(line(`Drag all ${doc.members.length} members`, all));
    console.log(line('Pan the view', pan));
    console.log(`After dropping the upright: ${afterOne}`);
    const worst = Math.max(one.median, all.median, pan.median);
    console.log(`Target 60 fps (median frame ≤ 16.7 ms, with the display's 16.7 ms refresh): ${worst <= 17.5 ? 'OK' : 'BELOW TARGET'}`);
  } finally {
    await browser.close();
    await stopProcess(server);
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
