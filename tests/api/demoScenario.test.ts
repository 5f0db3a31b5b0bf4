// The demo scenario, loaded into a database of its own exactly as the start command loads it: every
// state and kind of request, engineering checks that say what the story says they say, files in the
// S3 fake whose bytes match their recorded hashes, the mail delivered over SMTP, decision records
// made, and a second load that adds nothing.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { and, asc, count, eq, isNotNull } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachments, changeRequests, mailOutbox, projectMembers, requestConditions, requestRevisions, trailEvents, users } from '../../db/schema';
import { readCaught, startSmtpCatcher, type SmtpCatcher } from '../../docker-free-scripts/fakes/smtpCatcher';
import { demoPassword, demoPeople, demoProjects, seedDemo, type DemoSeedReport } from '../../server/demo/demoScenario';
import { verifyTrail } from '../../server/trail/trailChain';
import type { EngineeringCheck } from '../../shared/requests/engineeringCheck';
import { requestDraftSchema } from '../../shared/requests/requestBody';
import { requestTypes } from '../../shared/requests/requestBody';
import { requestStates } from '../../shared/requests/states';
import request from 'supertest';
import { buildTestApp, type TestApp } from '../support/apiHarness';
import { privateDatabase } from '../support/privateDatabase';
import { fakesDir, repoRoot } from '../support/testSettings';

const smtpPort = Number(process.env.TEST_API_SMTP_PORT) + 20;
const catcherPort = Number(process.env.TEST_API_CATCHER_PORT) + 20;
const mailDir = join(fakesDir('api'), 'mail-demo');
// A fixed seed time, so the waits and overdue flags below are the same on every run.
const seededAt = new Date('2026-11-30T20:00:00Z');

async function tally(t: TestApp) {
  const [[r], [e], [a], [u], [m]] = await Promise.all([
    t.db.select({ n: count() }).from(changeRequests),
    t.db.select({ n: count() }).from(trailEvents),
    t.db.select({ n: count() }).from(attachments),
    t.db.select({ n: count() }).from(users),
    t.db.select({ n: count() }).from(projectMembers),
  ]);
  return { requests: r!.n, trailEvents: e!.n, attachments: a!.n, users: u!.n, memberships: m!.n };
}

describe('the demo scenario', () => {
  let t: TestApp;
  let catcher: SmtpCatcher;
  let report: DemoSeedReport;

  const byTitle = async (title: string) => {
    const [row] = await t.db.select().from(changeRequests).where(eq(changeRequests.title, title));
    if (!row) throw new Error(`no demo request titled "${title}"`);
    return row;
  };
  const checkOf = async (title: string, revision?: number) => {
    const r = await byTitle(title);
    const [rev] = await t.db
      .select({ engineering: requestRevisions.engineering })
      .from(requestRevisions)
      .where(and(eq(requestRevisions.requestId, r.id), eq(requestRevisions.revision, revision ?? r.currentRevision)));
    return rev!.engineering as EngineeringCheck;
  };

  beforeAll(async () => {
    const url = await privateDatabase('spanrelay_api_demo_test');
    catcher = await startSmtpCatcher({ smtpPort, httpPort: catcherPort, directory: mailDir });
    t = buildTestApp({ DATABASE_URL: url, SMTP_PORT: String(smtpPort), MAIL_CATCHER_URL: `http://127.0.0.1:${catcherPort}` });
    report = await seedDemo({ db: t.db, store: t.store, publicUrl: t.env.PUBLIC_URL, now: seededAt });
  }, 120_000);
  afterAll(async () => {
    await t?.close();
    await catcher?.close();
  });

  it('holds about fifteen requests over three projects, in every state and of every kind', async () => {
    const rows = await t.db.select({ state: changeRequests.state, type: changeRequests.type }).from(changeRequests);
    expect(rows).toHaveLength(15);
    expect(Object.values(report.projects).map((p) => p.requestsAdded)).toEqual([5, 5, 5]);
    expect(new Set(rows.map((r) => r.state))).toEqual(new Set(requestStates));
    expect(new Set(rows.map((r) => r.type))).toEqual(new Set(requestTypes));
  });

  it('numbers each project’s requests in the order they were filed, with trails whose hash chains hold and whose times only go forward', async () => {
    const rows = await t.db.select().from(changeRequests).orderBy(asc(changeRequests.number));
    for (const code of Object.values(demoProjects).map((p) => p.code)) {
      const mine = rows.filter((r) => r.number.startsWith(code));
      const filed = mine.map((r) => r.createdAt.getTime());
      expect(filed).toEqual([...filed].sort((x, y) => x - y));
    }
    // The joint request's comments name the deck request by its number.
    expect(rows.find((r) => r.number === 'PC-0114-003')?.title).toBe('Place the three-span deck in one continuous placement');
    for (const r of rows) {
      expect(await verifyTrail(t.db, r.id)).toMatchObject({ ok: true });
      const times = (await t.db.select({ at: trailEvents.createdAt }).from(trailEvents).where(eq(trailEvents.requestId, r.id)).orderBy(asc(trailEvents.seq))).map((e) => e.at.getTime());
      expect(times).toEqual([...times].sort((x, y) => x - y));
      expect(Math.max(...times)).toBeLessThan(seededAt.getTime());
    }
  });

  it('keeps unfinished drafts valid as drafts', async () => {
    const { rows } = await t.pool.query<{ body: unknown }>(
      `select rv.body from request_revisions rv join change_requests r on r.id = rv.request_id where r.state = 'drafting'`,
    );
    expect(rows.length).toBeGreaterThanOrEqual(2);
    for (const { body } of rows) expect(requestDraftSchema.safeParse(body).success).toBe(true);
  });

  it('gives the deck placement requests the checks their stories turn on', async () => {
    // Pellam Creek: 455 ft × 44 ft × 9 in slab plus 0.1 cy/ft of haunch = 455·44·0.75/27 + 45.5
    // = 601.6 cy; at 60 cy/h, 10.0 h, plus the 2 h margin (our default) = 12.0 h of initial set
    // needed (ASTM C403 initial set is 500 psi penetration resistance; the margin is common practice).
    const single = await checkOf('Place the three-span deck in one continuous placement');
    expect(single.verdict).toBe('acceptable');
    const plan = (single.results as { plan: { singlePlacement: { volumeCy: number; minInitialSetHr: number } } }).plan;
    expect(plan.singlePlacement.volumeCy).toBeCloseTo((455 * 44 * 0.75) / 27 + 45.5, 1);
    expect(plan.singlePlacement.minInitialSetHr).toBeCloseTo(601.6 / 60 + 2, 1);
    // Harrowmere Road: 220 ft × 40 ft × 8.5 in + 0.08 cy/ft = 248.5 cy at 45 cy/h = 5.5 h + 2 h = 7.5 h,
    // more than the 6.0 h the Type B trial batch gave.
    const short = await checkOf('Place the two-span deck in one placement');
    expect(short.verdict).toBe('not_acceptable');
    expect(short.findings.join(' ')).toContain('shorter than the 7.5 h');
  });

  it('finds a joint moved into a negative-moment region and one moved clear of it', async () => {
    // Two equal spans under uniform load: zero moment at 0.75 L from each end support, so the
    // negative-moment region of 2 × 110 ft runs from 82.5 ft to 137.5 ft (AISC Manual Table 3-23,
    // case 29, from memory). Three spans 140-175-140: the region over pier 1 spans about 104 to
    // 176 ft (our continuous-beam module, itself tested against the AISC cases).
    expect((await checkOf('Move deck construction joint CJ-1 6 ft toward abutment 1')).verdict).toBe('acceptable');
    expect((await checkOf('Move deck construction joint CJ-2 closer to pier 1')).verdict).toBe('not_acceptable');
    const returned = 'Move deck construction joint CJ-2 toward the pier';
    expect((await checkOf(returned, 1)).verdict).toBe('not_acceptable');
    expect((await checkOf(returned, 2)).verdict).toBe('acceptable');
    expect((await byTitle(returned)).state).toBe('section_review');
  });

  it('passes one seal substitution and fails the one that swaps a finger joint for a strip seal', async () => {
    // 455 ft of steel deck, 0 to 120 °F (AASHTO LRFD 3.12.2.1 Procedure A, moderate climate) with
    // α = 6.5e-6 /°F (AASHTO LRFD 6.4.1, from memory): 6.5e-6 × 455 × 12 × 120 = 4.26 in, and
    // movement of 4 in or more takes a finger or modular joint (common practice).
    const finger = await checkOf('Replace the abutment 2 finger joint with a large strip seal');
    expect(finger.verdict).toBe('not_acceptable');
    const movement = (finger.results as { movement: { movementRangeIn: number } }).movement;
    expect(movement.movementRangeIn).toBeCloseTo(6.5e-6 * 455 * 12 * 120, 3);
    expect((await byTitle('Replace the abutment 2 finger joint with a large strip seal')).state).toBe('rejected');
    expect((await checkOf('Substitute strip seal at both abutments')).verdict).toBe('acceptable');
    expect((await checkOf('Alternate compression seal at both abutments')).verdict).toBe('acceptable');
  });

  it('has conditions open and satisfied, each satisfied one with its evidence', async () => {
    const deck = await byTitle('Place the three-span deck in one continuous placement');
    const conditions = await t.db.select().from(requestConditions).where(eq(requestConditions.requestId, deck.id)).orderBy(asc(requestConditions.seq));
    expect(conditions.map((c) => c.satisfiedAt !== null)).toEqual([true, false, false]);
    expect(deck.state).toBe('conditions_open');
    const closed = await byTitle('Move deck construction joint CJ-1 6 ft toward abutment 1');
    expect(closed.state).toBe('closed');
    const met = await t.db.select().from(requestConditions).where(and(eq(requestConditions.requestId, closed.id), isNotNull(requestConditions.satisfiedAt)));
    expect(met).toHaveLength(2);
    for (const c of [...conditions.filter((x) => x.satisfiedAt), ...met]) {
      const [evidence] = await t.db.select().from(attachments).where(eq(attachments.id, c.evidenceAttachmentId!));
      expect(evidence?.purpose).toBe('condition_evidence');
    }
  });

  it('stores every file in the S3 fake with the bytes its recorded hash names', async () => {
    const rows = await t.db.select().from(attachments);
    expect(rows.length).toBeGreaterThanOrEqual(20);
    expect(new Set(rows.map((a) => a.purpose))).toEqual(new Set(['revision', 'information_response', 'federal_concurrence', 'condition_evidence', 'decision_record']));
    for (const a of rows) {
      const object = await t.store.get(a.objectKey);
      const hash = createHash('sha256');
      for await (const chunk of object.body) hash.update(chunk as Buffer);
      expect(hash.digest('hex')).toBe(a.sha256);
      expect(object.contentType).toBe(a.contentType);
    }
  });

  it('makes each decision record a minute after its decision, not on the day the seed ran', async () => {
    const records = await t.db.select().from(attachments).where(eq(attachments.purpose, 'decision_record'));
    // Five decisions in the story: two approvals, two approvals with conditions, one rejection.
    expect(records).toHaveLength(5);
    for (const record of records) {
      const [decision] = await t.pool
        .query<{ created_at: Date }>(
          `select created_at from trail_events where request_id = $1 and event_type in ('approve', 'approve_with_conditions', 'reject')`,
          [record.requestId],
        )
        .then((r) => r.rows);
      expect(record.uploadedAt.getTime() - decision!.created_at.getTime()).toBe(60_000);
    }
  });

  it('delivers the mail of every move over SMTP, and the decision records’ too', async () => {
    const [queued] = await t.db.select({ n: count() }).from(mailOutbox);
    expect(queued!.n).toBeGreaterThan(40);
    await t.startJobs();
    await expect
      .poll(async () => (await t.db.select({ n: count() }).from(mailOutbox).where(eq(mailOutbox.status, 'pending')))[0]!.n, { timeout: 90_000, interval: 500 })
      .toBe(0);
    const caught = readCaught(mailDir);
    expect(caught.some((m) => m.to.includes(demoPeople.ruth.email) && m.subject.includes('PC-0114'))).toBe(true);
    expect(caught.some((m) => m.to.includes(demoPeople.wes.email) && m.subject.includes('HR-0231'))).toBe(true);
    expect(caught.filter((m) => m.subject.endsWith('decision record ready')).length).toBeGreaterThanOrEqual(5);
    // The jobs the decisions queued found their records made and added none.
    const [records] = await t.db.select({ n: count() }).from(attachments).where(eq(attachments.purpose, 'decision_record'));
    expect(records!.n).toBe(5);
    await t.stopJobs();
  }, 150_000);

  it('lets each demo person sign in and find their desk, with the waits the story gives', async () => {
    const agent = request.agent(t.app);
    const signIn = await agent.post('/api/auth/sign-in/email').set('origin', t.env.PUBLIC_URL).send({ email: demoPeople.ruth.email, password: demoPassword });
    expect(signIn.status).toBe(200);
    const desk = await agent.get('/api/requests?desk=mine&sort=due');
    expect(desk.status).toBe(200);
    const items = desk.body.items as { title: string; overdue: boolean }[];
    // Routed to Ruth Caldera 14 days before the seed; the engineer of record has 10 days.
    expect(items.find((i) => i.title === 'Move deck construction joint CJ-2 closer to pier 1')?.overdue).toBe(true);
  });

  it('lets every person the README lists sign in, and the README lists every demo person', async () => {
    const readme = readFileSync(join(repoRoot, 'README.md'), 'utf8');
    const table = readme.slice(readme.indexOf('| sign in as |'), readme.indexOf('## Trying it'));
    const listed = [...table.matchAll(/^\| `([^`]+@demo\.spanrelay\.test)` \|/gm)].map((m) => m[1]);
    expect(new Set(listed)).toEqual(new Set(Object.values(demoPeople).map((p) => p.email)));
    for (const email of listed) {
      const res = await request(t.app).post('/api/auth/sign-in/email').set('origin', t.env.PUBLIC_URL).send({ email, password: demoPassword });
      expect(res.status, email).toBe(200);
    }
  });

  it('adds nothing when it is loaded a second time', async () => {
    const before = await tally(t);
    const again = await seedDemo({ db: t.db, store: t.store, publicUrl: t.env.PUBLIC_URL });
    expect(Object.values(again.projects).map((p) => p.requestsAdded)).toEqual([0, 0, 0]);
    expect(await tally(t)).toEqual(before);
  });
});
