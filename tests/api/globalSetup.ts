// API suite: the fakes on their test ports and a freshly migrated database.
import { createDatabase } from '../../db/client';
import { runMigrations } from '../../db/migrate';
import { startSuiteFakes } from '../support/startFakes';
import { suitePorts } from '../support/testSettings';

export default async function setup() {
  const stopFakes = await startSuiteFakes('api');
  const { db, pool } = createDatabase(suitePorts('api').databaseUrl, 2);
  await runMigrations(db, pool);
  await pool.end();
  return stopFakes;
}
