import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

// vitest globalSetup for the `api` project: the tests run against a real PostgreSQL database named by
// DATABASE_URL, migrated once here. (Migrations run in a child process under tsx, because the migrator
// imports the TypeScript migration files itself.)
export default function setup(): void {
  if (!process.env.DATABASE_URL) {
    throw new Error(
      'DATABASE_URL is not set. The API tests need a PostgreSQL database they may empty: run `npm test`, ' +
        'or `DATABASE_URL=$(npx tsx scripts/db-up.ts slotwright_test) npx vitest run --project api`.',
    );
  }
  const root = fileURLToPath(new URL('../..', import.meta.url));
  execFileSync(process.execPath, ['--import', 'tsx', 'scripts/migrate.ts', 'up'], { cwd: root, stdio: 'inherit', env: process.env });
}
