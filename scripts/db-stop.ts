// Stops the local PostgreSQL cluster (`npm run db:stop`).
import { stopCluster } from './lib/postgres.ts';

stopCluster();
