// Brings the database named by DATABASE_URL up to the committed migrations and loads the demo scenario.
import { createDatabase } from '../db/client';
import { runMigrations } from '../db/migrate';
import { seedDemo } from '../server/demo/demoScenario';

async function main() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set');
  const { db, pool } = createDatabase(url, 2);
  try {
    await runMigrations(db, pool);
    await seedDemo(db, process.env.PUBLIC_URL);
  } finally {
    await pool.end();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
