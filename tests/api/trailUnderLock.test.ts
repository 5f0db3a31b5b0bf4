// Moves and comments that wait for the same request's row lock. A statement that waits for a lock
// keeps the snapshot it started with, so a move that read the trail's last link in its locking
// statement would chain onto a link already superseded by the move it waited for (a repeated seq,
// a broken chain). server/workflow/moveStatements.ts reads the link in the statement after the
// lock; this holds it to that: twenty comments and a move sent together all land, in one unbroken
// chain, with times that never go backwards.
import { asc, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { trailEvents } from '../../db/schema';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';
import { agentsFor, requestAt } from '../support/requestFixtures';

describe('the trail under the row lock', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
  });
  afterAll(() => t?.close());

  it('chains twenty concurrent comments and a move onto the link each one waited for', async () => {
    const { id, version } = await requestAt(t, s, a, 'section_review');
    const before = (await t.db.select().from(trailEvents).where(eq(trailEvents.requestId, id))).length;
    const comments = Array.from({ length: 20 }, (_, i) =>
      (i % 2 ? a.section_engineer : a.contractor).post(`/api/requests/${id}/comments`).send({ comment: `Note ${i} on the drain detail.` }),
    );
    const move = a.section_engineer.post(`/api/requests/${id}/events`).send({ type: 'forward', version: version(), comment: 'Forwarded.' });
    const answers = await Promise.all([...comments, move]);
    expect(answers.map((r) => r.status)).toEqual([...Array(20).fill(201), 200]);

    const events = await t.db.select().from(trailEvents).where(eq(trailEvents.requestId, id)).orderBy(asc(trailEvents.seq));
    expect(events).toHaveLength(before + 21);
    expect(events.map((e) => e.seq)).toEqual(events.map((_, i) => i + 1));
    for (let i = 1; i < events.length; i++) {
      expect(events[i]!.prevHash).toBe(events[i - 1]!.hash);
      expect(events[i]!.createdAt.getTime()).toBeGreaterThanOrEqual(events[i - 1]!.createdAt.getTime());
    }
    expect(events.filter((e) => e.eventType === 'forward')).toHaveLength(1);
    expect((await a.auditor.get(`/api/requests/${id}/trail/verify`)).body).toEqual({ ok: true, events: before + 21 });
  });
});
