// Statements sent by name, as prepared statements: PostgreSQL parses each once per connection and,
// after a few runs, keeps a generic plan, and the server skips building the query each time. The
// moves' few statements (server/workflow/moveStatements.ts) and a desk page's ids
// (server/requests/requestRepository.ts) go this way; under load they are mostly round trips, so
// the count and the cost of each trip are what they cost (DEVELOPERS.md, "Speed at agency size").
import type { PoolClient, QueryResultRow } from 'pg';
import type { Database, Transaction } from './client';

type Queryable = Pick<PoolClient, 'query'>;

// A transaction's statements must go to its own connection (drizzle's session client); outside one,
// any pooled connection will do.
function connectionOf(db: Database | Transaction): Queryable {
  if ('$client' in db && db.$client) return db.$client;
  const client = (db as unknown as { session?: { client?: Queryable } }).session?.client;
  if (!client || typeof client.query !== 'function') throw new Error('the transaction exposes no connection for named statements');
  return client;
}

export async function runNamed<R extends QueryResultRow>(db: Database | Transaction, name: string, text: string, values: unknown[]): Promise<R[]> {
  const { rows } = await connectionOf(db).query<R>({ name, text, values });
  return rows;
}
