// The process entry: read settings, connect, migrate, listen; stop cleanly on SIGTERM/SIGINT.
import { createDatabase } from '../db/client';
import { runMigrations } from '../db/migrate';
import { createApp } from './app';
import { createAuth } from './auth/auth';
import { readServerEnv } from './env';
import { createMailer } from './mail/mailer';
import { createOutboxDispatcher } from './mail/outbox';
import { createObjectStore } from './storage/objectStore';

async function main() {
  const env = readServerEnv();
  const { db, pool } = createDatabase(env.DATABASE_URL);
  await runMigrations(db);
  const mailer = createMailer(env);
  const outbox = createOutboxDispatcher(db, mailer);
  const app = createApp({
    env,
    db,
    auth: createAuth(db, env),
    store: createObjectStore(env),
    mailer,
    onMailQueued: () => void outbox.kick(),
  });
  outbox.start();
  void outbox.kick();

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
    outbox.stop();
    server.close(async () => {
      mailer.close();
      await pool.end();
      process.exit(0);
    });
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
