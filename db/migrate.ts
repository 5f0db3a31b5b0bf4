// Applies the committed migrations under drizzle/ and installs the job queue's own schema
// (graphile-worker keeps its tables in `graphile_worker`); safe to run at every start.
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { Logger, runMigrations as installJobQueue } from 'graphile-worker';
import { join } from 'node:path';
import type { Pool } from 'pg';
import type { Database } from './client';

export const migrationsFolder = join(__dirname, '..', 'drizzle');

export async function runMigrations(db: Database, pool: Pool): Promise<void> {
  await migrate(db, { migrationsFolder });
  await installJobQueue({ pgPool: pool, logger: quietLogger });
}

// graphile-worker logs every job at info level; we keep warnings and errors only.
export const quietLogger = new Logger(() => (level, message) => {
  if (level === 'error' || level === 'warning') console.error(`[jobs] ${level}: ${message}`);
});
