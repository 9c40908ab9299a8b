// Plain JavaScript: a worker thread does not inherit the TypeScript loader.
// A health probe in its own thread (its own event loop), so what it measures is the server's stall, not the
// benchmark's: GET /api/health every `everyMs`, one at a time, until told to stop; then the latencies.
import { parentPort, workerData } from 'node:worker_threads';

/** @type {{ url: string, everyMs: number }} */
const { url, everyMs } = workerData;
/** @type {number[]} */
const latencies = [];
let failures = 0;
let running = true;
parentPort?.on('message', (m) => {
  if (m === 'stop') running = false;
});

while (running) {
  const t0 = performance.now();
  try {
    const res = await fetch(url);
    await res.arrayBuffer();
    if (!res.ok) failures++;
  } catch {
    failures++;
  }
  latencies.push(performance.now() - t0);
  await new Promise((r) => setTimeout(r, everyMs));
}
parentPort?.postMessage({ latencies, failures });
