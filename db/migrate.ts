// Applies the committed migrations under drizzle/; safe to run at every start.
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { join } from 'node:path';
import type { Database } from './client';

export const migrationsFolder = join(__dirname, '..', 'drizzle');

export async function runMigrations(db: Database): Promise<void> {
  await migrate(db, { migrationsFolder });
}
