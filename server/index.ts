// The process entry: read settings, connect, migrate, start the job worker, listen; stop cleanly
// on SIGTERM/SIGINT.
import { setTimeout } from 'node:timers';
import { createDatabase } from '../db/client';
import { runMigrations } from '../db/migrate';
import { createApp } from './app';
import { createAuth } from './auth/auth';
import { readServerEnv } from './env';
import { startBackgroundJobs } from './jobs';
import { createMailer } from './mail/mailer';
import { createObjectStore } from './storage/objectStore';

async function main() {
  const env = readServerEnv();
  const { db, pool } = createDatabase(env.DATABASE_URL);
  await runMigrations(db, pool);
  const mailer = createMailer(env);
  const store = createObjectStore(env);
  const app = createApp({ env, db, auth: createAuth(db, env, mailer), store, mailer });
  const jobs = await startBackgroundJobs({ pool, db, mailer, store, publicUrl: env.PUBLIC_URL });

  const server = app.listen(env.PORT, '127.0.0.1', () => {
    console.log(`Spanrelay is running at http://127.0.0.1:${env.PORT}`);
  });
  server.on('error', (err) => {
    console.error(`[spanrelay] cannot listen on 127.0.0.1:${env.PORT}:`, err.message);
    process.exit(1);
  });

  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    server.close(async () => {
      await jobs.stop();
      mailer.close();
      await pool.end();
      process.exit(0);
    });
    setTimeout(() => process.exit(0), 8000).unref();
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
