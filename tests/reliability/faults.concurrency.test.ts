// Fifty people pressing the same button on the same version of a request: one move wins, the rest
// are told it changed under them, and the trail holds one event. Then the trail is tampered with
// in the two ways the append-only triggers cannot stop (a superuser with triggers off): removing a
// row, and rewriting one with its own hash recomputed. workflow.test.ts covers the plain rewrite.
import { and, asc, eq } from 'drizzle-orm';
import { Client } from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { changeRequests, trailEvents } from '../../db/schema';
import { hashedEventOf, trailHash } from '../../server/trail/trailChain';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';
import { faultTally } from '../support/faultTally';
import { agentsFor, requestAt } from '../support/requestFixtures';

const concurrency = faultTally('concurrency');
const tampering = faultTally('tampering');

describe('concurrent moves and a tampered trail', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
  });
  afterAll(async () => {
    concurrency.record('50 moves on one version of one request');
    tampering.record('a removed row, and a rewritten row with its own hash recomputed');
    await t?.close();
  });

  const eventsOf = (id: string) => t.db.select().from(trailEvents).where(eq(trailEvents.requestId, id)).orderBy(asc(trailEvents.seq));

  it('lets exactly one of 50 moves on the same version through; the other 49 get 409 and nothing is written for them', () =>
    concurrency.attempt(async () => {
      const { id, version } = await requestAt(t, s, a, 'section_review');
      const before = (await eventsOf(id)).length;
      const moves = Array.from({ length: 50 }, (_, i) =>
        i % 2 === 0
          ? a.section_engineer.post(`/api/requests/${id}/events`).send({ type: 'forward', version: version(), comment: `Forward ${i}` })
          : a.section_engineer.post(`/api/requests/${id}/events`).send({ type: 'return_for_revision', version: version(), comment: `Return ${i}` }),
      );
      const answers = await Promise.all(moves);
      const statuses = answers.map((r) => r.status);
      const won = answers.filter((r) => r.status === 200);
      const events = await eventsOf(id);
      concurrency.lose(Math.abs(events.length - before - 1));
      expect(statuses.filter((x) => x !== 200 && x !== 409), 'only 200 or 409').toEqual([]);
      expect(won).toHaveLength(1);
      for (const r of answers.filter((x) => x.status === 409)) expect(r.body.error.code).toBe('stale_version');
      expect(events).toHaveLength(before + 1);
      const [row] = await t.db.select().from(changeRequests).where(eq(changeRequests.id, id));
      expect(row!.version).toBe(version() + 1);
      expect(row!.state).toBe(events.at(-1)!.stateAfter);
      expect(events.at(-1)!.comment).toBe(won[0]!.body.trail.at(-1).comment);
      expect((await a.auditor.get(`/api/requests/${id}/trail/verify`)).body).toEqual({ ok: true, events: before + 1 });
    }));

  async function asSuperuserWithoutTriggers(work: (c: Client) => Promise<void>) {
    const client = new Client({ connectionString: t.env.DATABASE_URL });
    await client.connect();
    try {
      await client.query('set session_replication_role = replica');
      await work(client);
    } finally {
      await client.end();
    }
  }

  it('names the gap when a row is removed from the middle of a trail', () =>
    tampering.attempt(async () => {
      const { id } = await requestAt(t, s, a, 'eor_review');
      await asSuperuserWithoutTriggers((c) => c.query('delete from trail_events where request_id = $1 and seq = 2', [id]).then(() => undefined));
      const verified = await a.auditor.get(`/api/requests/${id}/trail/verify`);
      if (verified.body.ok !== false) tampering.lose(1);
      expect(verified.body).toEqual({ ok: false, brokenAt: 2 });
    }));

  it('catches a rewritten row whose own hash was recomputed, at the next row', () =>
    tampering.attempt(async () => {
      const { id } = await requestAt(t, s, a, 'eor_review');
      const [row] = await t.db.select().from(trailEvents).where(and(eq(trailEvents.requestId, id), eq(trailEvents.seq, 3)));
      // The forger knows the algorithm: the changed row hashes correctly against its predecessor.
      const forged = { ...hashedEventOf(row!), stateAfter: 'closed', comment: 'Approved at the desk.' };
      const hash = trailHash(row!.prevHash, forged);
      await asSuperuserWithoutTriggers((c) =>
        c.query('update trail_events set state_after = $1, comment = $2, hash = $3 where id = $4', [forged.stateAfter, forged.comment, hash, row!.id]).then(() => undefined),
      );
      const verified = await a.auditor.get(`/api/requests/${id}/trail/verify`);
      if (verified.body.ok !== false) tampering.lose(1);
      expect(verified.body).toEqual({ ok: false, brokenAt: 4 });
    }));
});
