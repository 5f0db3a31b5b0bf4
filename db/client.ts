// One pg pool per process, wrapped by Drizzle with the full schema.
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import { Pool, type PoolClient } from 'pg';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema> & { $client: Pool };
export type Transaction = Parameters<Parameters<Database['transaction']>[0]>[0];

export function createDatabase(url: string, max = 10): { db: Database; pool: Pool } {
  const pool = new Pool({ connectionString: url, max, connectionTimeoutMillis: 5000 });
  // An idle client losing its connection (a database restart) must not crash the process.
  pool.on('error', (err) => console.error('[spanrelay] database connection lost:', err.message));
  pool.on('connect', (client) => client.on('error', (err) => console.error('[spanrelay] database client error:', err.message)));
  giveBackBrokenClients(pool);
  const db = drizzle(pool, { schema });
  return { db, pool };
}

// A connection the pool could not open (the database down or restarting), told apart from other
// services refusing a connection when the error reaches the person (server/http/errors.ts).
export class DatabaseUnreachable extends Error {
  constructor(cause: unknown) {
    super(`database unreachable: ${cause instanceof Error ? cause.message : String(cause)}`, { cause });
  }
}

// Drizzle's transaction gives its client back only once BEGIN has succeeded; when the database
// closed the connection a moment before (a restart), BEGIN fails and the client stays checked out
// for good, so each restart shrank the pool until no request could get a connection. A client whose
// connection breaks while checked out goes back to the pool with its error (which drops it), and a
// second release by its holder is then a no-op.
function giveBackBrokenClients(pool: Pool): void {
  const connect = pool.connect.bind(pool) as (callback?: unknown) => Promise<PoolClient> | void;
  const checkedOut = async (): Promise<PoolClient> => {
    const client = await (connect() as Promise<PoolClient>).catch((err: unknown) => {
      throw new DatabaseUnreachable(err);
    });
    const release = client.release;
    let released = false;
    const giveBack = (err?: Error | boolean) => {
      if (released) return;
      released = true;
      client.off('error', broken);
      client.off('end', ended);
      release(err);
    };
    const broken = (err: Error) => giveBack(err);
    const ended = () => giveBack(new Error('the database closed the connection'));
    client.on('error', broken);
    client.on('end', ended);
    client.release = giveBack;
    return client;
  };
  // The callback form (used by no code of ours) is left as it is.
  pool.connect = ((callback?: unknown) => (callback ? connect(callback) : checkedOut())) as Pool['connect'];
}

export { schema };
