// How many statements a move sends while it holds the request's row lock: every one is a round
// trip that the next move on the request, and the pool, wait behind. A forward with one person to
// tell: begin, lock, membership (the read check), open conditions, the trail's last link with the
// database clock, the trail event, the request, who is told, the outbox row, its delivery job,
// commit. A comment: begin, lock, membership, last link and clock, the event, commit.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Actor } from '../../shared/requests/types';
import { addComment, applyEvent } from '../../server/workflow/workflowService';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';
import { agentsFor, requestAt } from '../support/requestFixtures';
import { withStatementCount } from '../support/statementCounter';

const counted = async (work: () => Promise<unknown>): Promise<number> => (await withStatementCount(work)).statements;

describe('statements per move', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  let engineer: Actor;

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    const p = s.sectionEngineer;
    engineer = { id: p.id, name: p.name, email: p.email, role: 'section_engineer', organization: null };
  });
  afterAll(() => t.close());

  it('forwards a request to central office (one person told) in eleven statements', async () => {
    const r = await requestAt(t, s, a, 'section_review');
    const n = await counted(() => applyEvent({ db: t.db, publicUrl: t.env.PUBLIC_URL }, engineer, r.id, { type: 'forward', version: r.version() }));
    expect(n).toBe(11);
    const after = await a.section_engineer.get(`/api/requests/${r.id}`);
    expect(after.body.state).toBe('central_routing');
    expect((await a.auditor.get(`/api/requests/${r.id}/trail/verify`)).body.ok).toBe(true);
  });

  it('records a comment in six statements', async () => {
    const r = await requestAt(t, s, a, 'section_review');
    expect(await counted(() => addComment(t.db, engineer, r.id, 'Checked against the field notes.'))).toBe(6);
    expect((await a.auditor.get(`/api/requests/${r.id}/trail/verify`)).body.ok).toBe(true);
  });
});
