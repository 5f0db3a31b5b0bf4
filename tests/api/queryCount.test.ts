// How many database queries a read makes: a fixed number, whatever the page size or the length of
// the trail (no query per row). Every statement sent by any pg client in this test process is
// counted, so the sign-in service's own session lookup is measured too and taken off with /api/me.
// Each read is counted with the session not remembered (server/auth/sessionCache.ts), so the
// lookup is part of every count and the difference is the read's own.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { forgetAllSessions } from '../../server/auth/sessionCache';
import { forgetReaderBreadths } from '../../server/requests/readerBreadth';
import { buildTestApp, createScenario, signIn, type TestApp } from '../support/apiHarness';
import { agentsFor, otherDeviationBody, requestAt } from '../support/requestFixtures';
import { withStatementCount } from '../support/statementCounter';

type Agent = Awaited<ReturnType<typeof signIn>>;

async function queriesOf(agent: Agent, path: string): Promise<number> {
  forgetAllSessions();
  forgetReaderBreadths();
  const { result: res, statements } = await withStatementCount(() => agent.get(path));
  expect(res.status, res.text).toBe(200);
  return statements;
}

describe('queries per read', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  let session: number;
  let longId: string;
  let shortId: string;

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    // Seven requests at the section engineer's desk, and a draft with a long trail of comments.
    for (let i = 0; i < 6; i++) await requestAt(t, s, a, 'section_review');
    shortId = (await requestAt(t, s, a, 'section_review')).id;
    const long = await a.contractor.post('/api/requests').send(otherDeviationBody(s.project.id, 'Relocate the bearing anchor bolts at pier 3'));
    longId = long.body.id;
    for (let i = 0; i < 12; i++) await a.contractor.post(`/api/requests/${longId}/comments`).send({ comment: `Site note ${i + 1}` });
    session = await queriesOf(a.section_engineer, '/api/me');
  });
  afterAll(() => t.close());

  it('looks the session up in a fixed number of queries (the measure the others are taken against)', () => {
    expect(session).toBeGreaterThanOrEqual(1);
    expect(session).toBeLessThanOrEqual(3);
  });

  it('lists a desk in three queries beyond the session (how many projects the reader is on, the page in order, its rows), for one row or a full page', async () => {
    const one = await queriesOf(a.section_engineer, '/api/requests?desk=mine&sort=due&limit=1');
    const page = await queriesOf(a.section_engineer, '/api/requests?desk=mine&sort=due&limit=25');
    expect(page - session).toBe(3);
    expect(one).toBe(page);
    // An empty desk stops after the page's ids.
    expect((await queriesOf(a.field_inspector, '/api/requests?desk=mine&sort=due')) - session).toBe(2);
  });

  it('counts a desk in two queries beyond the session', async () => {
    expect((await queriesOf(a.section_engineer, '/api/requests/counts?desk=mine')) - session).toBe(2);
  });

  it('searches the register in three queries beyond the session: the matching projects, the page, its rows', async () => {
    const few = await queriesOf(a.auditor, `/api/requests?q=${encodeURIComponent('bearing')}&limit=1`);
    const many = await queriesOf(a.auditor, `/api/requests?q=${encodeURIComponent(s.project.structureNumber)}&limit=25`);
    expect(many - session).toBe(3);
    expect(few).toBe(many);
  });

  it('reads one request in full in five queries beyond the session, however long its trail', async () => {
    const short = await queriesOf(a.contractor, `/api/requests/${shortId}`);
    const long = await queriesOf(a.contractor, `/api/requests/${longId}`);
    const detail = (await a.contractor.get(`/api/requests/${longId}`)).body as { trail: unknown[] };
    expect(detail.trail.length).toBe(13);
    expect(long - session).toBe(5);
    expect(short).toBe(long);
  });
});
