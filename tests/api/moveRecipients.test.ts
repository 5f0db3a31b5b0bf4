// Who a move tells, for the moves whose audience depends on the request rather than on the move
// alone: a withdrawal tells the desk it left (a role's members, or the one assigned engineer of
// record), a reassignment both engineers, the condition that closes a request the desks above the
// field. The people come with the request's row lock (server/workflow/moveStatements.ts), fetched
// by role and id before the move's outcome is known; these cases hold that set to the audiences
// (server/workflow/notifications.ts). Read from the outbox, one row per event and person.
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailOutbox, trailEvents } from '../../db/schema';
import { samplePdf } from '../support/sampleFiles';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';
import { agentsFor, requestAt } from '../support/requestFixtures';

describe('who a move tells', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
  });
  afterAll(() => t?.close());

  // The addresses told of the request's last trail event of this type, sorted.
  async function toldOf(requestId: string, eventType: string): Promise<string[]> {
    const events = await t.db.select().from(trailEvents).where(eq(trailEvents.requestId, requestId));
    const event = events.filter((e) => e.eventType === eventType).at(-1);
    expect(event, `a ${eventType} on the trail`).toBeDefined();
    const rows = await t.db.select().from(mailOutbox).where(eq(mailOutbox.requestId, requestId));
    return rows
      .filter((m) => m.idempotencyKey.startsWith(`trail:${event!.id}:`))
      .map((m) => m.toAddress)
      .sort();
  }
  const sorted = (...emails: string[]) => [...emails].sort();

  it('tells central office and the section engineers of a withdrawal from central routing', async () => {
    const r = await requestAt(t, s, a, 'central_routing');
    const res = await a.contractor.post(`/api/requests/${r.id}/events`).send({ type: 'withdraw', version: r.version() });
    expect(res.status, res.text).toBe(200);
    expect(await toldOf(r.id, 'withdraw')).toEqual(sorted(s.members.central_office.email, s.members.section_engineer.email));
  });

  it('tells the assigned engineer of record, and not the other one, of a withdrawal from their desk', async () => {
    const r = await requestAt(t, s, a, 'eor_review');
    const res = await a.contractor.post(`/api/requests/${r.id}/events`).send({ type: 'withdraw', version: r.version() });
    expect(res.status, res.text).toBe(200);
    expect(await toldOf(r.id, 'withdraw')).toEqual(sorted(s.members.engineer_of_record.email, s.members.section_engineer.email));
  });

  it('tells the new engineer of record (at their desk) and the one it was taken from', async () => {
    const r = await requestAt(t, s, a, 'eor_review');
    const res = await a.central_office.post(`/api/requests/${r.id}/events`).send({ type: 'reassign', version: r.version(), eorUserId: s.secondEor.id, comment: 'Workload.' });
    expect(res.status, res.text).toBe(200);
    expect(await toldOf(r.id, 'reassign')).toEqual(sorted(s.secondEor.email, s.members.engineer_of_record.email));
    const subjects = (await t.db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, s.secondEor.email))).map((m) => m.subject);
    expect(subjects).toContain(`${res.body.number}: reassigned to another engineer of record (at your desk)`);
  });

  it('tells the filer of a met condition, and the desks above too when it closes the request', async () => {
    const r = await requestAt(t, s, a, 'conditions_open');
    let version = r.version();
    const detail = await a.field_inspector.get(`/api/requests/${r.id}`);
    const conditions = detail.body.conditions as { id: string }[];
    expect(conditions).toHaveLength(2);
    for (const [i, condition] of conditions.entries()) {
      const upload = await a.field_inspector.post(`/api/requests/${r.id}/attachments?purpose=condition_evidence`).attach('files', await samplePdf(`Site check ${i + 1}`), `check-${i + 1}.pdf`);
      expect(upload.status, upload.text).toBe(201);
      const res = await a.field_inspector
        .post(`/api/requests/${r.id}/events`)
        .send({ type: 'satisfy_condition', version, conditionId: condition.id, evidenceAttachmentId: upload.body[0].id, comment: `Checked on site (${i + 1}).` });
      expect(res.status, res.text).toBe(200);
      version = res.body.version;
      const told = await toldOf(r.id, 'satisfy_condition');
      if (i === 0) expect(told).toEqual([s.members.contractor.email]);
      else expect(told).toEqual(sorted(s.members.contractor.email, s.members.section_engineer.email, s.members.central_office.email));
    }
  });
});
