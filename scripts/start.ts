// `npm start`: database ready, client built, one Express process serving the app and /api on 127.0.0.1.
// A server that dies (anything but our own stop) is started again, after a pause that grows while it keeps dying.
import type { ChildProcess } from 'node:child_process';
import { buildClient, prepareDatabase, startServer } from './lib/app-env.ts';
import { startMailFake } from './lib/mail-fake.ts';

const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? '127.0.0.1';
const { env } = await startMailFake((await prepareDatabase(process.env.SLOTWRIGHT_DB ?? 'slotwright')).env);
console.log('Building the client...');
buildClient();

let stopping = false;
let server: ChildProcess;
let delayMs = 1_000;

function run(): void {
  const startedAt = Date.now();
  server = startServer({ ...env, NODE_ENV: 'production', PORT: String(port), HOST: host });
  server.on('exit', (code, signal) => {
    if (stopping) process.exit(code ?? 0);
    // A server that ran a good while before dying starts again at once; one that dies at start-up backs off.
    if (Date.now() - startedAt > 60_000) delayMs = 1_000;
    console.error(`\nThe server stopped (${signal ?? `exit code ${code}`}); starting it again in ${delayMs / 1000} s\n`);
    setTimeout(run, delayMs);
    delayMs = Math.min(delayMs * 2, 30_000);
  });
}
run();
console.log(`\nSlotwright: http://${host}:${port}/  (Ctrl-C stops the app; 'npm run db:stop' stops the database)\n`);
// Ctrl-C reaches the server too (same process group); it closes its connections and we exit with it.
process.on('SIGINT', () => {
  stopping = true;
});
process.on('SIGTERM', () => {
  stopping = true;
  server.kill('SIGTERM');
});
