// The whole path through every desk, with a return and resubmission, a question to the contractor,
// conditions verified in the field, the trail chain and the mail each party receives.
import { asc, eq } from 'drizzle-orm';
import { Client } from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { trailEvents } from '../../db/schema';
import { buildTestApp, createScenario, waitForMail, type TestApp } from '../support/apiHarness';
import { agentsFor, deckPlacementBody, proposedConditions, requestAt } from '../support/requestFixtures';
import { samplePdf, samplePhoto } from '../support/sampleFiles';

describe('a request through every desk', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  beforeAll(async () => {
    t = buildTestApp();
    await t.startJobs();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
  });
  afterAll(() => t.close());

  it('goes from drafting to closed, keeping revisions, conditions and a verifiable trail', async () => {
    const body = deckPlacementBody(s.project.id);
    let r = (await a.contractor.post('/api/requests').send(body)).body;
    const id = r.id;
    const move = async (agent: (typeof a)[keyof typeof a], event: Record<string, unknown>, state: string) => {
      const res = await agent.post(`/api/requests/${id}/events`).send({ version: r.version, ...event });
      expect(res.status, `${String(event.type)}: ${res.text}`).toBe(200);
      expect(res.body.state).toBe(state);
      r = res.body;
      return res.body;
    };

    await move(a.contractor, { type: 'submit' }, 'section_review');
    // The server computed and stored the engineering check of revision 1.
    expect(r.revisions[0].engineering).toMatchObject({ kind: 'deck_placement_change', verdict: 'acceptable', engineeringVersion: expect.any(String) });
    expect(r.revisions[0].engineering.caution).toMatch(/do not replace the engineer of record/i);

    await move(a.section_engineer, { type: 'return_for_revision', comment: 'Show the standby pump location on the sheet.' }, 'revising');
    expect(r.currentRevision).toBe(2);
    const edited = { ...body, proposedChange: `${body.proposedChange} A standby pump stands at pier 1.` };
    const saved = await a.contractor.put(`/api/requests/${id}/draft`).send({ version: r.version, body: edited });
    expect(saved.status).toBe(200);
    r = saved.body;
    await move(a.contractor, { type: 'resubmit', comment: 'Standby pump added.' }, 'section_review');
    // Both revisions stay readable, and the second says what changed.
    expect(r.revisions.map((v: { revision: number }) => v.revision)).toEqual([1, 2]);
    expect(r.revisions[1].changes).toEqual([{ path: 'proposedChange', before: body.proposedChange, after: edited.proposedChange }]);

    await move(a.section_engineer, { type: 'forward', comment: 'Checked against the field: pump access is clear.' }, 'central_routing');
    await move(a.central_office, { type: 'route', eorUserId: s.members.engineer_of_record.id }, 'eor_review');
    expect(r.assignedEor.id).toBe(s.members.engineer_of_record.id);
    await move(a.engineer_of_record, { type: 'request_information', comment: 'What is the cold-joint plan if a pump fails?' }, 'information_requested');
    await move(a.contractor, { type: 'provide_information', comment: 'Emergency joint at 0.4 of span 2, see the revised sheet.' }, 'eor_review');
    await move(a.engineer_of_record, { type: 'approve_with_conditions', conditions: proposedConditions, comment: 'Approved as noted.' }, 'conditions_open');
    expect(r.decision).toBe('approved_with_conditions');
    expect(r.conditions.map((c: { text: string }) => c.text)).toEqual(proposedConditions.map((c) => c.text));

    for (const condition of r.conditions) {
      const evidence = await a.field_inspector.post(`/api/requests/${id}/attachments?purpose=condition_evidence`).attach('files', await samplePhoto(), `condition-${condition.seq}.jpg`);
      expect(evidence.status).toBe(201);
      await move(
        a.field_inspector,
        { type: 'satisfy_condition', conditionId: condition.id, evidenceAttachmentId: evidence.body[0].id, comment: `Seen on site (condition ${condition.seq}).` },
        condition.seq < r.conditions.length ? 'conditions_open' : 'closed',
      );
    }
    expect(r.conditions.every((c: { satisfied: boolean }) => c.satisfied)).toBe(true);
    expect(r.availableActions).toEqual([]);

    const types = r.trail.map((e: { eventType: string }) => e.eventType);
    expect(types).toEqual([
      'created', 'submit', 'return_for_revision', 'resubmit', 'forward', 'route', 'request_information',
      'provide_information', 'approve_with_conditions', 'satisfy_condition', 'satisfy_condition',
    ]);
    expect(r.trail[2]).toMatchObject({ actorRole: 'section_engineer', comment: 'Show the standby pump location on the sheet.', stateBefore: 'section_review', stateAfter: 'revising' });
    const verified = await a.auditor.get(`/api/requests/${id}/trail/verify`);
    expect(verified.body).toEqual({ ok: true, events: types.length });

    // Each party was told when the request reached them, and the contractor of every return and decision.
    const subjects = async (email: string) => (await waitForMail(t.env, email)).map((m) => m.subject);
    await expect.poll(async () => (await subjects(s.members.contractor.email)).length, { timeout: 15_000 }).toBeGreaterThanOrEqual(4);
    expect(await subjects(s.members.contractor.email)).toEqual(
      expect.arrayContaining([
        `${r.number}: returned for revision (at your desk)`,
        `${r.number}: asked for more information (at your desk)`,
        `${r.number}: approved with conditions`,
        `${r.number}: marked a condition satisfied`,
      ]),
    );
    expect(await subjects(s.members.section_engineer.email)).toEqual(
      expect.arrayContaining([`${r.number}: submitted to the section engineer (at your desk)`, `${r.number}: resubmitted as a new revision (at your desk)`]),
    );
    expect(await subjects(s.members.central_office.email)).toContain(`${r.number}: forwarded to central office (at your desk)`);
    expect(await subjects(s.members.engineer_of_record.email)).toEqual(
      expect.arrayContaining([`${r.number}: routed to an engineer of record (at your desk)`, `${r.number}: answered the question (at your desk)`]),
    );
    expect(await subjects(s.members.field_inspector.email)).toContain(`${r.number}: approved with conditions (at your desk)`);
    // Nobody is mailed about their own move.
    expect(await subjects(s.members.engineer_of_record.email)).not.toContain(`${r.number}: approved with conditions`);
  });

  it('refuses a second move made on the same version: one succeeds, the other gets 409, one event written', async () => {
    const { id, version } = await requestAt(t, s, a, 'section_review');
    const [forward, giveBack] = await Promise.all([
      a.section_engineer.post(`/api/requests/${id}/events`).send({ type: 'forward', version: version() }),
      a.section_engineer.post(`/api/requests/${id}/events`).send({ type: 'return_for_revision', version: version(), comment: 'Wrong sheet attached.' }),
    ]);
    expect([forward.status, giveBack.status].sort()).toEqual([200, 409]);
    const loser = forward.status === 409 ? forward : giveBack;
    expect(loser.body.error.code).toBe('stale_version');
    expect(loser.body.error.message).toMatch(/Reload it/);
    // In chain order: rows come back in storage order otherwise, and a rolled-back insert's space
    // is reused once vacuumed.
    const events = await t.db.select().from(trailEvents).where(eq(trailEvents.requestId, id)).orderBy(asc(trailEvents.seq));
    expect(events.map((e) => e.eventType)).toEqual(['created', 'submit', forward.status === 200 ? 'forward' : 'return_for_revision']);
  });

  it('lets central office reassign to another engineer of record, who alone may then decide', async () => {
    const { id, version } = await requestAt(t, s, a, 'eor_review');
    const res = await a.central_office.post(`/api/requests/${id}/events`).send({ type: 'reassign', version: version(), eorUserId: s.secondEor.id, comment: 'Workload.' });
    expect(res.status).toBe(200);
    expect(res.body.assignedEor.id).toBe(s.secondEor.id);
    const refused = await a.engineer_of_record.post(`/api/requests/${id}/events`).send({ type: 'approve', version: res.body.version });
    expect(refused.status).toBe(403);
    expect((await waitForMail(t.env, s.secondEor.email)).map((m) => m.subject)).toContain(`${res.body.number}: reassigned to another engineer of record (at your desk)`);
  });

  it('lets the contractor withdraw before a decision, and never after', async () => {
    const open = await requestAt(t, s, a, 'central_routing');
    expect((await a.contractor.post(`/api/requests/${open.id}/events`).send({ type: 'withdraw', version: open.version() })).status).toBe(200);
    const decided = await requestAt(t, s, a, 'rejected');
    const late = await a.contractor.post(`/api/requests/${decided.id}/events`).send({ type: 'withdraw', version: decided.version() });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('not_now');
  });

  it('refuses a return or a rejection without a comment', async () => {
    const { id, version } = await requestAt(t, s, a, 'section_review');
    const res = await a.section_engineer.post(`/api/requests/${id}/events`).send({ type: 'return_for_revision', version: version() });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.comment).toBeDefined();
  });

  it('keeps comments on the trail without moving the request', async () => {
    const { id, version } = await requestAt(t, s, a, 'section_review');
    const res = await a.section_engineer.post(`/api/requests/${id}/comments`).send({ comment: 'Site visit booked for Tuesday.' });
    expect(res.status).toBe(201);
    expect(res.body.version).toBe(version());
    expect(res.body.trail.at(-1)).toMatchObject({ eventType: 'commented', comment: 'Site visit booked for Tuesday.', stateAfter: 'section_review' });
    expect((await a.auditor.post(`/api/requests/${id}/comments`).send({ comment: 'Auditors observe.' })).status).toBe(403);
  });

  it('makes the trail append-only, and reports tampering at the right sequence', async () => {
    const { id } = await requestAt(t, s, a, 'eor_review');
    const client = new Client({ connectionString: t.env.DATABASE_URL });
    await client.connect();
    try {
      await expect(client.query('update trail_events set comment = $1 where request_id = $2', ['rewritten', id])).rejects.toThrow(/append-only/);
      await expect(client.query('delete from trail_events where request_id = $1', [id])).rejects.toThrow(/append-only/);
      // A superuser can switch triggers off for one session: the chain still gives the change away.
      await client.query('set session_replication_role = replica');
      await client.query('update trail_events set comment = $1 where request_id = $2 and seq = 3', ['Looks fine to me.', id]);
    } finally {
      await client.end();
    }
    const verified = await a.auditor.get(`/api/requests/${id}/trail/verify`);
    expect(verified.body).toEqual({ ok: false, brokenAt: 3 });
  });
});

describe('federal-aid projects', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db, { federalAid: true });
    a = await agentsFor(t, s);
  });
  afterAll(() => t.close());

  it('holds the decision on a major change until central office records the concurrence letter', async () => {
    const { id, version } = await requestAt(t, s, a, 'eor_review');
    let v = version();
    const send = async (agent: (typeof a)[keyof typeof a], event: Record<string, unknown>) => {
      const res = await agent.post(`/api/requests/${id}/events`).send({ version: v, ...event });
      if (res.status === 200) v = res.body.version;
      return res;
    };
    const unclassified = await send(a.engineer_of_record, { type: 'approve' });
    expect(unclassified.status).toBe(409);
    expect(unclassified.body.error.message).toMatch(/classify/);
    expect((await send(a.central_office, { type: 'classify_change', majorChange: true })).status).toBe(200);
    const held = await send(a.engineer_of_record, { type: 'approve' });
    expect(held.status).toBe(409);
    expect(held.body.error.message).toMatch(/23 CFR 635\.120\(a\)/);
    const letter = await a.central_office.post(`/api/requests/${id}/attachments?purpose=federal_concurrence`).attach('files', await samplePdf('Concurrence of the federal oversight agency'), 'concurrence.pdf');
    expect(letter.status).toBe(201);
    expect((await send(a.central_office, { type: 'record_federal_concurrence', letterAttachmentId: letter.body[0].id })).status).toBe(200);
    const approved = await send(a.engineer_of_record, { type: 'approve' });
    expect(approved.status).toBe(200);
    expect(approved.body.state).toBe('closed');
  });
});
