// The few statements every move sends, as named prepared statements on the transaction's own
// connection: PostgreSQL parses each once per connection and, after a few runs, keeps a generic plan;
// the server skips building the query each time. A move under load is mostly round trips, so their
// count and their cost per trip are what a move costs (DEVELOPERS.md, "Speed at agency size").
import type { PoolClient, QueryResultRow } from 'pg';
import type { Transaction } from '../../db/client';

type Queryable = Pick<PoolClient, 'query'>;

// Drizzle's transaction runs on one pooled connection (its session's client); named statements must
// go to that same connection, inside the transaction.
function connectionOf(tx: Transaction): Queryable {
  const client = (tx as unknown as { session?: { client?: Queryable } }).session?.client;
  if (!client || typeof client.query !== 'function') throw new Error('the transaction exposes no connection for named statements');
  return client;
}

export async function runNamed<R extends QueryResultRow>(tx: Transaction, name: string, text: string, values: unknown[]): Promise<R[]> {
  const { rows } = await connectionOf(tx).query<R>({ name, text, values });
  return rows;
}
