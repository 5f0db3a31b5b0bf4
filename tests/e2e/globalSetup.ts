// E2E suite: fakes, a migrated and seeded database, and the real server process serving the
// exported web build, exactly as the start command runs it.
import { spawn, type ChildProcess } from 'node:child_process';
import { setTimeout as sleep } from 'node:timers/promises';
import { createDatabase } from '../../db/client';
import { runMigrations } from '../../db/migrate';
import { seedDemo } from '../../server/demo/demoScenario';
import { createObjectStore } from '../../server/storage/objectStore';
import { startSuiteFakes } from '../support/startFakes';
import { repoRoot, testServerEnv } from '../support/testSettings';

export default async function setup() {
  const stopFakes = await startSuiteFakes('e2e');
  const env = testServerEnv('e2e');
  const { db, pool } = createDatabase(env.DATABASE_URL, 2);
  await runMigrations(db, pool);
  await seedDemo({ db, store: createObjectStore(env), publicUrl: env.PUBLIC_URL });
  await pool.end();

  if (!process.env.WEB_DIST) throw new Error('WEB_DIST is not set: the test command exports the web app first');
  const server: ChildProcess = spawn('npx', ['tsx', 'server/index.ts'], {
    cwd: repoRoot,
    env: { ...process.env, ...Object.fromEntries(Object.entries(env).map(([k, v]) => [k, String(v)])), NODE_ENV: 'development' },
    stdio: ['ignore', 'inherit', 'inherit'],
    // Its own process group, so stopping it also stops the node process npx starts.
    detached: true,
  });
  const healthUrl = `${env.PUBLIC_URL}/api/health`;
  for (let i = 0; ; i++) {
    try {
      if ((await fetch(healthUrl)).ok) break;
    } catch {
      // not listening yet
    }
    if (i > 120 || server.exitCode !== null) {
      if (server.pid && server.exitCode === null) process.kill(-server.pid, 'SIGKILL');
      await stopFakes();
      throw new Error(`the server did not come up at ${healthUrl}`);
    }
    await sleep(500);
  }

  return async () => {
    if (server.exitCode === null && server.pid) {
      const exited = new Promise((r) => server.once('exit', r));
      process.kill(-server.pid, 'SIGTERM');
      await exited;
    }
    await stopFakes();
  };
}
