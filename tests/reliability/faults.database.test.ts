// PostgreSQL restarted (fast: sessions cut off) while people move and read requests. Requests in
// flight are answered 503 in our error shape, never hang; health says the database is down, then
// up; the server reconnects by itself; and no move answered 200 is lost or half applied.
import { asc, eq, inArray, sql } from 'drizzle-orm';
import { Client } from 'pg';
import { createDatabase } from '../../db/client';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { changeRequests, trailEvents } from '../../db/schema';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';
import { faultTally } from '../support/faultTally';
import { startPrivateCluster, type PrivateCluster } from '../support/privateCluster';
import { agentsFor, otherDeviationBody } from '../support/requestFixtures';

const tally = faultTally('fault: postgres restart');
// Moves that do not count towards the version (the request's own creation, comments).
const notMoves = new Set(['created', 'commented']);

describe('a database restart under load', () => {
  let cluster: PrivateCluster | undefined;
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  beforeAll(async () => {
    cluster = await startPrivateCluster();
    const url = await cluster.migratedDatabase('spanrelay_faults_restart');
    t = buildTestApp({ DATABASE_URL: url });
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
  }, 120_000);
  afterAll(async () => {
    tally.record('pg_ctl stop -m fast and start while 6 desks move and read');
    try {
      // A pool that cannot end (a client never given back) must not keep the cluster running.
      await Promise.race([t?.close(), sleep(10_000).then(() => Promise.reject(new Error('the app did not close within 10 s')))]);
    } finally {
      await cluster?.destroy();
    }
  });

  it('fails requests in flight cleanly, reconnects, and leaves no move half applied', () =>
    tally.attempt(async () => {
      const ids: string[] = [];
      for (let i = 0; i < 6; i++) ids.push((await a.contractor.post('/api/requests').send(otherDeviationBody(s.project.id, `Restart ${i}`))).body.id);

      // The next move for each state on a loop that never ends: the question and its answer repeat.
      const nextMove: Record<string, [keyof typeof a, Record<string, unknown>]> = {
        drafting: ['contractor', { type: 'submit' }],
        section_review: ['section_engineer', { type: 'forward' }],
        central_routing: ['central_office', { type: 'route', eorUserId: s.members.engineer_of_record.id }],
        eor_review: ['engineer_of_record', { type: 'request_information', comment: 'Which pump, which reach?' }],
        information_requested: ['contractor', { type: 'provide_information', comment: 'Two 47 m booms.' }],
      };
      const answers: { phase: string; status: number; code?: string; hung?: boolean }[] = [];
      const answered: { id: string; version: number }[] = [];
      let phase = 'before';
      let stop = false;
      const note = (status: number, body: { error?: { code?: string } } | undefined) => answers.push({ phase, status, code: body?.error?.code });

      const desk = async (id: string) => {
        for (let round = 0; round < 400 && !stop; round++) {
          try {
            const read = await a.auditor.get(`/api/requests/${id}`).timeout(15_000);
            note(read.status, read.body);
            if (read.status !== 200) {
              await sleep(100);
              continue;
            }
            const [who, event] = nextMove[read.body.state as string]!;
            const moved = await a[who].post(`/api/requests/${id}/events`).send({ version: read.body.version, ...event }).timeout(15_000);
            note(moved.status, moved.body);
            if (moved.status === 200) answered.push({ id, version: moved.body.version });
          } catch (err) {
            // A timeout or a socket that never answered: exactly what must not happen.
            answers.push({ phase, status: 0, hung: true, code: String(err) });
          }
        }
      };
      const health: string[] = [];
      const watchHealth = async () => {
        while (!stop) {
          const res = await a.auditor.get('/api/health').timeout(15_000).catch(() => null);
          const db = res?.body?.db ?? 'no answer';
          if (health.at(-1) !== db) health.push(db);
          await sleep(100);
        }
      };

      const running = [...ids.map(desk), watchHealth()];
      await sleep(1500);
      phase = 'restart';
      // The outage lasts until health has said so (or 10 s): a fast machine can stop and start the
      // cluster between two polls, and then "down" would never be seen.
      await cluster!.restart(async () => {
        for (const until = Date.now() + 10_000; Date.now() < until && !health.includes('down'); ) await sleep(50);
      });
      phase = 'after';
      // Wait for moves to go through again after the restart, within bounds.
      const deadline = Date.now() + 30_000;
      while (Date.now() < deadline && answers.filter((x) => x.phase === 'after' && x.status === 200).length < 30) await sleep(200);
      await sleep(300);
      stop = true;
      await Promise.all(running);

      const refused = answers.filter((x) => x.status !== 200);
      // Refused while the database is away: 503 in our error shape, telling the person to try again.
      const unclean = answers.filter((x) => !(x.status === 200 || (x.status === 503 && x.code === 'database_unavailable')));
      console.log(`[faults] database restart: ${answers.length} answers, ${refused.length} refused`, JSON.stringify(tallyOf(refused)), 'health', health.join(' > '));
      expect(unclean, 'every answer is a success or a 503 saying the database is away').toEqual([]);
      expect(answers.filter((x) => x.phase === 'before' && x.status === 200).length).toBeGreaterThan(0);
      expect(answers.filter((x) => x.phase === 'after' && x.status === 200).length, 'moves go through again after the restart').toBeGreaterThanOrEqual(30);
      expect(health[0]).toBe('up');
      expect(health).toContain('down');
      expect(health.at(-1)).toBe('up');
      // Every connection a failed request took is back in the pool (or dropped): a leaked one would
      // shrink the pool for good and the server would never fully recover.
      expect(t.pool.totalCount - t.pool.idleCount, 'database connections still checked out').toBe(0);

      // Nothing half applied: the state is the last event's, the version counts the moves, and
      // every move answered 200 is on the trail.
      const rows = await t.db.select().from(changeRequests).where(inArray(changeRequests.id, ids));
      const events = await t.db.select().from(trailEvents).where(inArray(trailEvents.requestId, ids)).orderBy(asc(trailEvents.seq));
      let lost = 0;
      for (const row of rows) {
        const mine = events.filter((e) => e.requestId === row.id);
        const moves = mine.filter((e) => !notMoves.has(e.eventType)).length;
        expect(row.state, row.id).toBe(mine.at(-1)!.stateAfter);
        expect(row.version, row.id).toBe(1 + moves);
        const highestAnswered = Math.max(1, ...answered.filter((x) => x.id === row.id).map((x) => x.version));
        if (highestAnswered > row.version) lost += highestAnswered - row.version;
        expect((await a.auditor.get(`/api/requests/${row.id}/trail/verify`)).body).toMatchObject({ ok: true, events: mine.length });
      }
      tally.lose(lost);
      expect(lost).toBe(0);
      const [first] = await t.db.select().from(changeRequests).where(eq(changeRequests.id, ids[0]!));
      expect(first!.version).toBeGreaterThan(1);
    }), 120_000);

  it('gives back pooled connections the database closed just before a transaction began', () =>
    tally.attempt(async () => {
      // Whether the pool notices the closed connection before handing it out is a race, so the
      // close is tried ten times; each time the pool must end with nothing checked out.
      let begunOnClosed = 0;
      for (let round = 0; round < 10; round++) {
        // One connection, so the transaction is handed the one closed under it.
        const { db, pool } = createDatabase(t.env.DATABASE_URL, 1);
        try {
          const [{ pid } = { pid: 0 }] = (await db.execute<{ pid: number }>(sql`select pg_backend_pid() as pid`)).rows;
          const admin = new Client({ connectionString: t.env.DATABASE_URL });
          await admin.connect();
          await admin.query('select pg_terminate_backend($1)', [pid]);
          const failed = await db.transaction(async (tx) => void (await tx.execute(sql`select 1`))).then(() => false, () => true);
          if (failed) begunOnClosed += 1;
          await admin.end();
          // And the pool works again at once.
          expect((await db.execute<{ n: number }>(sql`select 1 as n`)).rows[0]!.n).toBe(1);
        } finally {
          const ended = await Promise.race([pool.end().then(() => true), sleep(3000).then(() => false)]);
          if (!ended) tally.lose(1);
          expect(ended, 'the pool ends: no connection left checked out').toBe(true);
        }
      }
      console.log(`[faults] transactions begun on a just-closed connection: ${begunOnClosed} of 10`);
    }));
});

function tallyOf(list: { status: number; code?: string }[]) {
  const out: Record<string, number> = {};
  for (const x of list) out[`${x.status} ${x.code ?? ''}`.trim()] = (out[`${x.status} ${x.code ?? ''}`.trim()] ?? 0) + 1;
  return out;
}