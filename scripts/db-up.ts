// Starts the local cluster (creating it if needed) and the development database; prints DATABASE_URL.
import { ensureDatabase, startCluster } from './lib/postgres.ts';

const { cluster } = startCluster();
const url = await ensureDatabase(cluster, process.argv[2] ?? 'slotwright');
console.log(url);
