// A PostgreSQL cluster of a test file's own (initdb into a temp folder, a free loopback port), for
// tests that stop or restart the database itself and must never touch the shared test cluster.
// As root it belongs to the postgres OS user, because initdb refuses root (as docker-free-scripts/lib.sh).
import { execFile } from 'node:child_process';
import { chmodSync, chownSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { Client } from 'pg';
import { createDatabase } from '../../db/client';
import { runMigrations } from '../../db/migrate';
import { freePort } from './freePort';

const exec = promisify(execFile);

function pgBin(): string {
  const versions = readdirSync('/usr/lib/postgresql').sort((a, b) => Number(a) - Number(b));
  const bin = join('/usr/lib/postgresql', versions.at(-1) ?? '', 'bin');
  if (!existsSync(join(bin, 'initdb'))) throw new Error('PostgreSQL binaries not found under /usr/lib/postgresql (the test command installs them)');
  return bin;
}

const asRoot = process.getuid?.() === 0;

async function asOwner(command: string, args: string[], timeoutMs = 90_000) {
  const [file, argv] = asRoot ? ['runuser', ['-u', 'postgres', '--', command, ...args]] : [command, args];
  return exec(file, argv, { cwd: '/', timeout: timeoutMs });
}

function ownerIds(): { uid: number; gid: number } | null {
  if (!asRoot) return null;
  const line = readFileSync('/etc/passwd', 'utf8').split('\n').find((l) => l.startsWith('postgres:'));
  if (!line) throw new Error('running as root without a postgres OS user to own the cluster');
  const [, , uid, gid] = line.split(':');
  return { uid: Number(uid), gid: Number(gid) };
}

export type PrivateCluster = {
  port: number;
  // A fresh migrated database on this cluster.
  migratedDatabase(name: string): Promise<string>;
  // whileDown runs between the stop and the start, so a test can watch the outage itself.
  restart(whileDown?: () => Promise<void>): Promise<void>;
  stop(): Promise<void>;
  // Stops the cluster if it runs and removes its folder.
  destroy(): Promise<void>;
};

export async function startPrivateCluster(): Promise<PrivateCluster> {
  const bin = pgBin();
  const dir = mkdtempSync('/tmp/spanrelay-cluster-');
  const data = join(dir, 'data');
  const owner = ownerIds();
  if (owner) chownSync(dir, owner.uid, owner.gid);
  chmodSync(dir, 0o700);
  const port = await freePort();
  const ctl = (...args: string[]) => asOwner(join(bin, 'pg_ctl'), ['-D', data, ...args]);
  const started = async () => {
    await ctl('-l', join(dir, 'postgres.log'), '-w', '-t', '60', '-o', `-c listen_addresses=127.0.0.1 -p ${port} -k ${dir} -c fsync=off`, 'start');
  };
  try {
    await asOwner(join(bin, 'initdb'), ['-D', data, '-U', 'postgres', '-A', 'trust', '-E', 'UTF8', '--no-locale']);
    await started();
  } catch (err) {
    rmSync(dir, { recursive: true, force: true });
    throw err;
  }
  const running = async () => (await ctl('status').then(() => true, () => false));
  return {
    port,
    async migratedDatabase(name) {
      const admin = new Client({ connectionString: `postgres://postgres@127.0.0.1:${port}/postgres` });
      await admin.connect();
      try {
        await admin.query(`create database "${name}"`);
      } finally {
        await admin.end();
      }
      const url = `postgres://postgres@127.0.0.1:${port}/${name}`;
      const { db, pool } = createDatabase(url, 2);
      await runMigrations(db, pool);
      await pool.end();
      return url;
    },
    // What `pg_ctl restart -m fast` does (open sessions are cut off, as in an operator's restart),
    // in two steps so the server's log keeps going to its file and not to this process's pipe.
    async restart(whileDown) {
      await ctl('-m', 'fast', '-w', '-t', '60', 'stop');
      try {
        await whileDown?.();
      } finally {
        await started();
      }
    },
    async stop() {
      if (await running()) await ctl('-m', 'fast', '-w', 'stop');
    },
    async destroy() {
      try {
        if (await running()) await ctl('-m', 'immediate', '-w', 'stop');
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    },
  };
}
