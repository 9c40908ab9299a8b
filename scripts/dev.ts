// `npm run dev`: the API restarted on change (tsx watch) and the Vite dev server with hot reload and an /api proxy.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { prepareDatabase, startServer, stopProcess } from './lib/app-env.ts';
import { startMailFake } from './lib/mail-fake.ts';
import { projectRoot } from './lib/postgres.ts';

const { env } = await startMailFake((await prepareDatabase(process.env.SLOTWRIGHT_DB ?? 'slotwright')).env);
const api = startServer({ ...env, NODE_ENV: 'development' }, { watch: true });
const vite = spawn(process.execPath, [join(projectRoot, 'node_modules/vite/bin/vite.js')], { env, cwd: projectRoot, stdio: 'inherit' });
const stop = async () => {
  await Promise.all([stopProcess(api), stopProcess(vite)]);
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
