// How many statements a move sends while it holds the request's row lock: every one is a round
// trip that the next move on the request, and the pool, wait behind (server/workflow/moveStatements.ts).
// A forward with one person to tell: begin; the lock with the actor's membership and the people the
// move may tell; the open conditions with the trail's last link and the database clock (after the
// lock, so they include the move that held it); the record (trail event, request, outbox row and its
// delivery job in one statement); commit. It was eleven, one statement for each of those.
// A comment: begin, the lock with membership, last link and clock, the event, commit (was six).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Actor } from '../../shared/requests/types';
import { addComment, applyEvent } from '../../server/workflow/workflowService';
import { eq } from 'drizzle-orm';
import { mailOutbox } from '../../db/schema';
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

  it('forwards a request to central office (one person told) in five statements', async () => {
    const r = await requestAt(t, s, a, 'section_review');
    const mailsBefore = (await t.db.select().from(mailOutbox).where(eq(mailOutbox.requestId, r.id))).length;
    const n = await counted(() => applyEvent({ db: t.db, publicUrl: t.env.PUBLIC_URL }, engineer, r.id, { type: 'forward', version: r.version() }));
    expect(n).toBe(5);
    const after = await a.section_engineer.get(`/api/requests/${r.id}`);
    expect(after.body.state).toBe('central_routing');
    expect(after.body.version).toBe(r.version() + 1);
    // The one statement that records the move also queued the message to central office.
    const mails = (await t.db.select().from(mailOutbox).where(eq(mailOutbox.requestId, r.id))).slice(mailsBefore);
    expect(mails.map((m) => m.toAddress)).toEqual([s.members.central_office.email]);
    expect((await a.auditor.get(`/api/requests/${r.id}/trail/verify`)).body.ok).toBe(true);
  });

  it('records a comment in five statements', async () => {
    const r = await requestAt(t, s, a, 'section_review');
    expect(await counted(() => addComment(t.db, engineer, r.id, 'Checked against the field notes.'))).toBe(5);
    expect((await a.auditor.get(`/api/requests/${r.id}/trail/verify`)).body.ok).toBe(true);
  });
});
