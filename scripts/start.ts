// `npm start`: database ready, client built, one Express process serving the app and /api on 127.0.0.1.
import { buildClient, prepareDatabase, startServer } from './lib/app-env.ts';
import { startMailFake } from './lib/mail-fake.ts';

const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? '127.0.0.1';
const { env } = await startMailFake((await prepareDatabase(process.env.SLOTWRIGHT_DB ?? 'slotwright')).env);
console.log('Building the client...');
buildClient();
const server = startServer({ ...env, NODE_ENV: 'production', PORT: String(port), HOST: host });
console.log(`\nSlotwright: http://${host}:${port}/  (Ctrl-C stops the app; 'npm run db:stop' stops the database)\n`);
// Ctrl-C reaches the server too (same process group); it closes its connections and we exit with it.
process.on('SIGINT', () => undefined);
process.on('SIGTERM', () => server.kill('SIGTERM'));
server.on('exit', (code) => process.exit(code ?? 0));
