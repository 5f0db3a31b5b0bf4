// Counts every statement any pg client in this test process sends (the app's pool, better-auth's,
// the job worker's): a read or a move is held to a number of round trips, not timed. Importing this
// patches pg once for the test file's process.
import pg from 'pg';

let statements = 0;
let texts: string[] = [];
const clientQuery = pg.Client.prototype.query;
pg.Client.prototype.query = function countedQuery(this: pg.Client, ...args: unknown[]) {
  statements += 1;
  const first = args[0] as string | { text?: string } | undefined;
  texts.push(typeof first === 'string' ? first : (first?.text ?? ''));
  return (clientQuery as (...a: unknown[]) => unknown).apply(this, args);
} as typeof clientQuery;

// The work's result and the statements sent while it ran (how many, and their SQL).
export async function withStatementCount<T>(work: () => PromiseLike<T>): Promise<{ result: T; statements: number; texts: string[] }> {
  statements = 0;
  texts = [];
  const result = await work();
  return { result, statements, texts };
}
