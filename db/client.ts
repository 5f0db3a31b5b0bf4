// One pg pool per process, wrapped by Drizzle with the full schema.
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema>;
export type Transaction = Parameters<Parameters<Database['transaction']>[0]>[0];

export function createDatabase(url: string, max = 10): { db: Database; pool: Pool } {
  const pool = new Pool({ connectionString: url, max, connectionTimeoutMillis: 5000 });
  // An idle client losing its connection (a database restart) must not crash the process.
  pool.on('error', (err) => console.error('[spanrelay] database connection lost:', err.message));
  pool.on('connect', (client) => client.on('error', (err) => console.error('[spanrelay] database client error:', err.message)));
  const db = drizzle(pool, { schema });
  return { db, pool };
}

export { schema };
