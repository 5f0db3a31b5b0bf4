// A database of a test file's own on the test cluster, for tests whose job queue or clock must not
// be shared with other files running at the same time.
import { Client } from 'pg';
import { createDatabase } from '../../db/client';
import { runMigrations } from '../../db/migrate';
import { suitePorts } from './testSettings';

export async function privateDatabase(name: string): Promise<string> {
  const base = new URL(suitePorts('api').databaseUrl);
  const admin = new Client({ connectionString: `${base.protocol}//${base.username}@${base.host}/postgres` });
  await admin.connect();
  try {
    await admin.query(`drop database if exists "${name}" with (force)`);
    await admin.query(`create database "${name}"`);
  } finally {
    await admin.end();
  }
  const url = `${base.protocol}//${base.username}@${base.host}/${name}`;
  const { db, pool } = createDatabase(url, 2);
  await runMigrations(db, pool);
  await pool.end();
  return url;
}
