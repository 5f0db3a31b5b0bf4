// Brings the database named by DATABASE_URL up to the committed migrations and loads the demo
// scenario (its files through the S3 fake named by the environment).
import { createDatabase } from '../db/client';
import { runMigrations } from '../db/migrate';
import { seedDemo } from '../server/demo/demoScenario';
import { readServerEnv } from '../server/env';
import { createObjectStore } from '../server/storage/objectStore';

async function main() {
  const env = readServerEnv();
  const { db, pool } = createDatabase(env.DATABASE_URL, 2);
  try {
    await runMigrations(db, pool);
    const started = Date.now();
    const report = await seedDemo({ db, store: createObjectStore(env), publicUrl: env.PUBLIC_URL });
    const added = Object.values(report.projects).reduce((n, p) => n + p.requestsAdded, 0);
    console.log(
      added > 0
        ? `[spanrelay] demo scenario loaded: ${added} requests on ${Object.keys(report.projects).length} projects in ${((Date.now() - started) / 1000).toFixed(1)} s`
        : '[spanrelay] demo scenario already loaded; `npm start -- --reset` starts it over',
    );
  } finally {
    await pool.end();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
