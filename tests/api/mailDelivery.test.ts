// Mail through the job queue, on a database and SMTP catcher of this file's own: delivered exactly
// once across an SMTP outage and two worker processes, and overdue reminders once per period.
import { join } from 'node:path';
import { count, eq } from 'drizzle-orm';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailOutbox } from '../../db/schema';
import { startSmtpCatcher, readCaught, type SmtpCatcher } from '../../docker-free-scripts/fakes/smtpCatcher';
import { sendDeskReminders } from '../../server/workflow/deskReminders';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';
import { privateDatabase } from '../support/privateDatabase';
import { agentsFor, requestAt } from '../support/requestFixtures';
import { fakesDir } from '../support/testSettings';

const smtpPort = Number(process.env.TEST_API_SMTP_PORT) + 10;
const catcherPort = Number(process.env.TEST_API_CATCHER_PORT) + 10;
const mailDir = join(fakesDir('api'), 'mail-private');

describe('mail delivery through the job queue', () => {
  let catcher: SmtpCatcher | null;
  let first: TestApp;
  let second: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;

  beforeAll(async () => {
    const url = await privateDatabase('spanrelay_api_mail_test');
    catcher = await startSmtpCatcher({ smtpPort, httpPort: catcherPort, directory: mailDir });
    const settings = { DATABASE_URL: url, SMTP_PORT: String(smtpPort), MAIL_CATCHER_URL: `http://127.0.0.1:${catcherPort}` };
    // Two apps on one database stand for two server processes, each with its own job worker.
    first = buildTestApp(settings);
    second = buildTestApp(settings);
    s = await createScenario(first.db);
    a = await agentsFor(first, s);
  }, 60_000);
  afterAll(async () => {
    await Promise.all([first?.close(), second?.close()]);
    await catcher?.close();
  });

  it('holds mail while SMTP is down and delivers every message exactly once when it is back', async () => {
    await catcher!.close();
    catcher = null;
    await Promise.all([first.startJobs(), second.startJobs()]);

    // 20 moves while nothing listens on the SMTP port.
    for (let i = 0; i < 5; i++) await requestAt(first, s, a, 'eor_review');
    const [queued] = await first.db.select({ n: count() }).from(mailOutbox);
    expect(queued!.n).toBeGreaterThanOrEqual(10);
    await sleep(1500);
    const [{ n: sentDuringOutage } = { n: -1 }] = await first.db.select({ n: count() }).from(mailOutbox).where(eq(mailOutbox.status, 'sent'));
    expect(sentDuringOutage).toBe(0);

    catcher = await startSmtpCatcher({ smtpPort, httpPort: catcherPort, directory: mailDir });
    await expect
      .poll(async () => (await first.db.select({ n: count() }).from(mailOutbox).where(eq(mailOutbox.status, 'pending')))[0]!.n, { timeout: 90_000, interval: 500 })
      .toBe(0);
    const caught = readCaught(mailDir);
    const rows = await first.db.select().from(mailOutbox);
    expect(caught).toHaveLength(rows.length);
    // One message per outbox row: no key twice, none missing.
    const keys = caught.map((m) => `${m.to.join(',')}|${m.subject}|${m.text}`);
    expect(new Set(keys).size).toBe(caught.length);
    expect(rows.every((r) => r.attempts >= 1 && r.sentAt !== null)).toBe(true);
    expect(rows.some((r) => r.attempts >= 2 && r.lastError)).toBe(true);
  }, 120_000);

  it('sends an overdue reminder once per overdue period, to the desk that holds the request', async () => {
    const { id } = await requestAt(first, s, a, 'section_review');
    const day = 24 * 60 * 60 * 1000;
    const reminderRows = async () =>
      (await first.db.select().from(mailOutbox).where(eq(mailOutbox.requestId, id))).filter((m) => m.subject.includes('overdue'));
    // Section engineers have 5 days by default (shared/workflow/desks.ts).
    await sendDeskReminders(first.db, first.env.PUBLIC_URL, new Date(Date.now() + 4 * day));
    expect(await reminderRows()).toHaveLength(0);
    await sendDeskReminders(first.db, first.env.PUBLIC_URL, new Date(Date.now() + 6 * day));
    await sendDeskReminders(first.db, first.env.PUBLIC_URL, new Date(Date.now() + 7 * day));
    const once = await reminderRows();
    expect(once.map((m) => m.toAddress)).toEqual([s.members.section_engineer.email]);
    await sendDeskReminders(first.db, first.env.PUBLIC_URL, new Date(Date.now() + 11 * day));
    expect(await reminderRows()).toHaveLength(2);
  });
});
