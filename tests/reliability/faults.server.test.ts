// The server process killed (SIGKILL, no chance to tidy up) in the middle of 200 concurrent moves,
// then started again: every answer given before the kill holds, nothing is half applied, each
// trail verifies, and a move that got no answer can be sent again and is either taken or refused
// as already done, never applied twice.
import { asc, inArray } from 'drizzle-orm';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDatabase, type Database } from '../../db/client';
import { changeRequests, mailOutbox, trailEvents } from '../../db/schema';
import type { ServerEnv } from '../../server/env';
import { createScenario, testPassword } from '../support/apiHarness';
import { faultTally } from '../support/faultTally';
import { freePort } from '../support/freePort';
import { privateDatabase } from '../support/privateDatabase';
import { otherDeviationBody } from '../support/requestFixtures';
import { startServerProcess, type ServerProcess } from '../support/serverProcess';
import { suitePorts, testServerEnv } from '../support/testSettings';

const tally = faultTally('fault: server killed');
const moves = 200;

type Outcome = { id: string; status: number | 'no answer' };

describe('the server killed during 200 concurrent moves', () => {
  let env: ServerEnv;
  let server: ServerProcess | null = null;
  let db: Database;
  let end: () => Promise<void>;
  let s: Awaited<ReturnType<typeof createScenario>>;
  beforeAll(async () => {
    const base = new URL(suitePorts('api').databaseUrl).pathname.slice(1);
    const url = await privateDatabase(`${base}_faults_kill`);
    const port = await freePort();
    env = testServerEnv('api', { DATABASE_URL: url, PORT: String(port), PUBLIC_URL: `http://127.0.0.1:${port}` });
    const database = createDatabase(url, 4);
    db = database.db;
    end = () => database.pool.end();
    s = await createScenario(db);
    server = await startServerProcess(env);
  }, 120_000);
  afterAll(async () => {
    tally.record(`SIGKILL at the first answers of ${moves} concurrent submits, then a restart`);
    await server?.kill('SIGKILL');
    await end?.();
  });

  async function cookieFor(email: string): Promise<string> {
    const res = await fetch(`${env.PUBLIC_URL}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: env.PUBLIC_URL },
      body: JSON.stringify({ email, password: testPassword }),
    });
    if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}`);
    return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  }
  const call = (cookie: string, method: string, path: string, body?: unknown) =>
    fetch(`${env.PUBLIC_URL}${path}`, {
      method,
      headers: { cookie, 'content-type': 'application/json', origin: env.PUBLIC_URL },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: AbortSignal.timeout(30_000),
    });

  it('keeps every answered move, half applies none, and takes a resent one at most once', () =>
    tally.attempt(async () => {
      const contractor = await cookieFor(s.contractor.email);
      const ids: string[] = [];
      for (let i = 0; i < moves; i += 10) {
        const made = await Promise.all(
          Array.from({ length: 10 }, async (_, j) => {
            const res = await call(contractor, 'POST', '/api/requests', otherDeviationBody(s.project.id, `Killed mid-move ${i + j}`));
            if (res.status !== 201) throw new Error(`create answered ${res.status}`);
            return ((await res.json()) as { id: string }).id;
          }),
        );
        ids.push(...made);
      }

      let answered = 0;
      const outcomes: Promise<Outcome>[] = ids.map(async (id): Promise<Outcome> => {
        try {
          const res = await call(contractor, 'POST', `/api/requests/${id}/events`, { type: 'submit', version: 1 });
          answered += 1;
          await res.arrayBuffer();
          return { id, status: res.status };
        } catch {
          return { id, status: 'no answer' };
        }
      });
      // Killed at the first answers: by then some moves are answered, others written but not yet
      // answered, others not yet begun.
      const deadline = Date.now() + 30_000;
      while (answered < 3 && Date.now() < deadline) await sleep(2);
      await server!.kill('SIGKILL');
      const results = await Promise.all(outcomes);
      server = await startServerProcess(env);

      const ok = results.filter((r) => typeof r.status === 'number' && r.status < 300);
      const silent = results.filter((r) => r.status === 'no answer');
      const other = results.filter((r) => typeof r.status === 'number' && r.status >= 300);
      expect(other, 'no move refused before the kill').toEqual([]);
      expect(silent.length, 'the kill came while moves were in flight').toBeGreaterThan(0);

      const rows = await db.select().from(changeRequests).where(inArray(changeRequests.id, ids));
      const events = await db.select().from(trailEvents).where(inArray(trailEvents.requestId, ids)).orderBy(asc(trailEvents.seq));
      const mail = await db.select().from(mailOutbox).where(inArray(mailOutbox.requestId, ids));
      const submitted = new Set(events.filter((e) => e.eventType === 'submit').map((e) => e.requestId));
      let lost = 0;
      for (const row of rows) {
        const mine = events.filter((e) => e.requestId === row.id);
        // All or nothing: the state, the version, the trail and the mail agree.
        expect(row.state, row.id).toBe(mine.at(-1)!.stateAfter);
        expect(row.version, row.id).toBe(submitted.has(row.id) ? 2 : 1);
        expect(mail.some((m) => m.requestId === row.id), `mail of ${row.id}`).toBe(submitted.has(row.id));
      }
      for (const r of ok) if (!submitted.has(r.id)) lost += 1;
      const appliedUnanswered = silent.filter((r) => submitted.has(r.id)).length;
      console.log(`[faults] server killed: ${ok.length} answered 2xx, ${silent.length} without answer (${appliedUnanswered} of them applied), ${submitted.size} on the trail`);
      tally.lose(lost);
      expect(lost, 'moves answered 2xx but missing from the trail').toBe(0);
      expect(submitted.size).toBe(ok.length + appliedUnanswered);

      const auditor = await cookieFor(s.members.auditor.email);
      const unverified: string[] = [];
      for (let i = 0; i < ids.length; i += 20) {
        const batch = await Promise.all(ids.slice(i, i + 20).map(async (id) => [id, await (await call(auditor, 'GET', `/api/requests/${id}/trail/verify`)).json()] as const));
        for (const [id, v] of batch) if (!(v as { ok: boolean }).ok) unverified.push(id);
      }
      expect(unverified, 'trails that do not verify').toEqual([]);

      // The people who got no answer send their move again: taken once, or refused as stale.
      const resent = await Promise.all(silent.map(async (r) => ({ id: r.id, status: (await call(contractor, 'POST', `/api/requests/${r.id}/events`, { type: 'submit', version: 1 })).status })));
      for (const r of resent) expect(r.status, r.id).toBe(submitted.has(r.id) ? 409 : 200);
      const after = await db.select().from(trailEvents).where(inArray(trailEvents.requestId, ids));
      const doubled = ids.filter((id) => after.filter((e) => e.requestId === id && e.eventType === 'submit').length !== 1);
      tally.lose(doubled.length);
      expect(doubled, 'requests not submitted exactly once').toEqual([]);
    }), 240_000);
});
