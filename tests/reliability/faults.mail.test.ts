// The SMTP server goes down in the middle of 50 moves and comes back: every move still answers
// 200, health says mail is down meanwhile, and each queued message arrives exactly once (counted
// by its Message-ID, which carries the outbox's idempotency key), none lost.
import { join } from 'node:path';
import { count, eq, inArray } from 'drizzle-orm';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailOutbox } from '../../db/schema';
import { readCaught, startSmtpCatcher, type SmtpCatcher } from '../../docker-free-scripts/fakes/smtpCatcher';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';
import { faultTally } from '../support/faultTally';
import { freePort } from '../support/freePort';
import { privateDatabase } from '../support/privateDatabase';
import { agentsFor, otherDeviationBody } from '../support/requestFixtures';
import { fakesDir, suitePorts } from '../support/testSettings';

const tally = faultTally('fault: smtp down');
const mailDir = join(fakesDir('api'), 'mail-faults');

describe('an SMTP outage during 50 moves', () => {
  let catcher: SmtpCatcher | null = null;
  let ports: { smtpPort: number; httpPort: number };
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  beforeAll(async () => {
    // A database of our own: the job queue is database-wide, and this file's worker must not
    // pick up (and hold back) other files' mail.
    const base = new URL(suitePorts('api').databaseUrl).pathname.slice(1);
    const url = await privateDatabase(`${base}_faults_mail`);
    ports = { smtpPort: await freePort(), httpPort: await freePort() };
    catcher = await startSmtpCatcher({ ...ports, directory: mailDir });
    await fetch(`${catcher.httpUrl}/messages`, { method: 'DELETE' });
    t = buildTestApp({ DATABASE_URL: url, SMTP_PORT: String(ports.smtpPort), MAIL_CATCHER_URL: catcher.httpUrl });
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    await t.startJobs();
  }, 60_000);
  afterAll(async () => {
    tally.record('catcher stopped after 10 of 50 moves, started again after 40');
    await t?.close();
    await catcher?.close();
  });

  it('delivers every message exactly once after the outage, and says mail is down while it lasts', () =>
    tally.attempt(async () => {
      const ids: string[] = [];
      for (let i = 0; i < 10; i++) ids.push((await a.contractor.post('/api/requests').send(otherDeviationBody(s.project.id, `Mail outage ${i}`))).body.id);
      // Five moves per request, each telling the next desk (or the contractor).
      const steps: [keyof typeof a, Record<string, unknown>][] = [
        ['contractor', { type: 'submit' }],
        ['section_engineer', { type: 'forward' }],
        ['central_office', { type: 'route', eorUserId: s.members.engineer_of_record.id }],
        ['engineer_of_record', { type: 'request_information', comment: 'Send the drain detail.' }],
        ['contractor', { type: 'provide_information', comment: 'Sheet D-3 revised.' }],
      ];
      let done = 0;
      const statuses: number[] = [];
      const healthDuringOutage: { status: number; smtp: string }[] = [];
      const chain = async (id: string) => {
        let version = 1;
        for (const [who, event] of steps) {
          // Hold the later moves until the outage has begun and the first moves are in.
          while (done >= 10 && catcher && done < 40 && !outage.started) await sleep(20);
          const res = await a[who].post(`/api/requests/${id}/events`).send({ version, ...event }).timeout(15_000);
          statuses.push(res.status);
          if (res.status === 200) version = res.body.version;
          done += 1;
        }
      };
      const outage = { started: false };
      const controller = (async () => {
        while (done < 10) await sleep(20);
        await catcher!.close();
        catcher = null;
        outage.started = true;
        const health = await a.auditor.get('/api/health');
        healthDuringOutage.push({ status: health.status, smtp: health.body.smtp });
        while (done < 40) await sleep(20);
        // Long enough that the worker has tried and failed at least once.
        await sleep(1500);
        catcher = await startSmtpCatcher({ ...ports, directory: mailDir });
      })();
      await Promise.all([...ids.map(chain), controller]);

      expect(statuses.filter((x) => x !== 200), 'every move is answered 200 whatever mail does').toEqual([]);
      expect(statuses).toHaveLength(50);
      expect(healthDuringOutage).toEqual([{ status: 503, smtp: 'down' }]);

      const pending = async () => (await t.db.select({ n: count() }).from(mailOutbox).where(eq(mailOutbox.status, 'pending')))[0]!.n;
      await expect.poll(pending, { timeout: 90_000, interval: 500 }).toBe(0);
      const rows = await t.db.select().from(mailOutbox).where(inArray(mailOutbox.requestId, ids));
      expect(rows.length).toBeGreaterThanOrEqual(50);
      expect(rows.some((r) => r.attempts >= 2 && r.lastError), 'the outage made some deliveries fail first').toBe(true);

      const caught = readCaught(mailDir);
      const timesCaught = new Map<string, number>();
      for (const m of caught) timesCaught.set(m.messageId, (timesCaught.get(m.messageId) ?? 0) + 1);
      const expected = rows.map((r) => `<${r.idempotencyKey}@spanrelay.mail>`);
      const missing = expected.filter((id) => !timesCaught.has(id));
      const doubled = [...timesCaught.entries()].filter(([, n]) => n > 1).map(([id]) => id);
      const strangers = [...timesCaught.keys()].filter((id) => !expected.includes(id));
      tally.lose(missing.length + doubled.length);
      console.log(`[faults] smtp outage: ${rows.length} messages queued, ${caught.length} caught, ${rows.filter((r) => r.attempts >= 2).length} retried`);
      expect(missing, 'messages never delivered').toEqual([]);
      expect(doubled, 'messages delivered twice').toEqual([]);
      expect(strangers).toEqual([]);
    }), 150_000);
});
