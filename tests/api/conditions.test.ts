// The conditions list: who sees which conditions, open ones by default, met ones with their
// evidence on request, and the whole field confirmation through the API down to the S3 fake.
import { createHash } from 'node:crypto';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachments } from '../../db/schema';
import type { ConditionList, ConditionListItem } from '../../shared/conditions/types';
import { buildTestApp, createScenario, s3ClientFor, type TestApp } from '../support/apiHarness';
import { agentsFor, proposedConditions, requestAt } from '../support/requestFixtures';
import { samplePdf, samplePhoto } from '../support/sampleFiles';

type Scenario = Awaited<ReturnType<typeof createScenario>>;
type Agents = Awaited<ReturnType<typeof agentsFor>>;

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const ofRequest = (list: ConditionList, id: string) => list.items.filter((i) => i.request.id === id);

describe('conditions list', () => {
  let t: TestApp;
  let s: Scenario;
  let a: Agents;
  // The same roles on the scenario's other project, who are not members of the first.
  let o: Agents;
  let ours: { id: string; version: () => number };
  let theirs: { id: string; version: () => number };

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    const other = { ...s, project: s.otherProject, members: s.outsiders };
    o = await agentsFor(t, other);
    ours = await requestAt(t, s, a, 'conditions_open');
    theirs = await requestAt(t, other, o, 'conditions_open');
  });
  afterAll(() => t.close());

  const list = async (agent: Agents[keyof Agents], query = '') => {
    const res = await agent.get(`/api/conditions${query}`);
    expect(res.status, res.text).toBe(200);
    return res.body as ConditionList;
  };

  it('lists the open conditions of the caller’s projects, with the request and the approval', async () => {
    const mine = await list(a.field_inspector);
    const rows = ofRequest(mine, ours.id);
    expect(rows.map((r) => [r.condition.seq, r.condition.text, r.condition.dueBefore])).toEqual(
      proposedConditions.map((c, i) => [i + 1, c.text, c.dueBefore]),
    );
    const first = rows[0]!;
    expect(first.condition).toMatchObject({ satisfied: false, satisfiedBy: null, note: null, evidence: null });
    expect(first.request).toMatchObject({ id: ours.id, title: 'At conditions_open', state: 'conditions_open', version: ours.version() });
    expect(first.request.number).toMatch(new RegExp(`^${s.project.code}-\\d{3}$`));
    expect(first.request).toMatchObject({ projectId: s.project.id, projectName: s.project.name, structureNumber: s.project.structureNumber });
    expect(first.approvedBy).toEqual({ id: s.members.engineer_of_record.id, name: s.members.engineer_of_record.name, organization: 'engineer-of-record org' });

    // The approval time is the trail's own record of the move.
    const detail = (await a.field_inspector.get(`/api/requests/${ours.id}`)).body;
    const approval = detail.trail.find((e: { eventType: string }) => e.eventType === 'approve_with_conditions');
    expect(first.approvedAt).toBe(approval.at);
    expect(mine.truncated).toBe(false);
  });

  it('leaves out the conditions of projects the caller is not on; auditors see every project', async () => {
    expect(ofRequest(await list(a.field_inspector), theirs.id)).toEqual([]);
    expect(ofRequest(await list(o.field_inspector), ours.id)).toEqual([]);
    expect(ofRequest(await list(o.field_inspector), theirs.id)).toHaveLength(2);
    // Other desks on the project read them too (the same rule as the requests).
    expect(ofRequest(await list(a.contractor), ours.id)).toHaveLength(2);
    expect(ofRequest(await list(o.contractor), ours.id)).toEqual([]);

    const audited = await list(a.auditor);
    expect(ofRequest(audited, ours.id)).toHaveLength(2);
    expect(ofRequest(audited, theirs.id)).toHaveLength(2);
    // Narrowed to one project on request.
    const narrowed = await list(a.auditor, `?projectId=${s.otherProject.id}`);
    expect(narrowed.items.length).toBeGreaterThan(0);
    expect(narrowed.items.every((i) => i.request.projectId === s.otherProject.id)).toBe(true);
    // A non-member naming a project changes nothing: the filter narrows, never widens.
    expect(ofRequest(await list(o.field_inspector, `?projectId=${s.project.id}`), ours.id)).toEqual([]);
  });

  it('puts the oldest approval first', async () => {
    const later = await requestAt(t, s, a, 'conditions_open');
    const ids = (await list(a.field_inspector)).items.map((i) => i.request.id);
    expect(ids.indexOf(ours.id)).toBeGreaterThanOrEqual(0);
    expect(ids.lastIndexOf(ours.id)).toBeLessThan(ids.indexOf(later.id));
    const times = (await list(a.field_inspector)).items.map((i) => i.approvedAt!);
    expect([...times].sort()).toEqual(times);
  });

  it('is refused without a session, and answers 400 to a query it does not know', async () => {
    const { default: request } = await import('supertest');
    expect((await request(t.app).get('/api/conditions')).status).toBe(401);
    for (const query of ['?status=closed', '?projectId=not-a-project', '?status=open&sort=newest']) {
      const res = await a.field_inspector.get(`/api/conditions${query}`);
      expect(res.status, query).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
    }
    const unknown = await a.field_inspector.get('/api/conditions?sort=newest');
    expect(unknown.body.error.fields).toEqual({ sort: 'This field is not accepted here.' });
  });

  it('follows a condition from open to met: evidence stored in S3, the request closed, met ones listed with ?status=all', async () => {
    const photo = await samplePhoto(80, 60, '#6b7378');
    const pdf = await samplePdf('Set-time test report, job cement lot 4');
    const [set, pump] = ofRequest(await list(a.field_inspector), ours.id) as [ConditionListItem, ConditionListItem];

    const upload = async (bytes: Buffer, name: string) => {
      const res = await a.field_inspector.post(`/api/requests/${ours.id}/attachments?purpose=condition_evidence`).attach('files', bytes, name);
      expect(res.status, res.text).toBe(201);
      return res.body[0] as { id: string; sha256: string; purpose: string };
    };
    const satisfy = (item: ConditionListItem, version: number, evidenceId: string, comment: string) =>
      a.field_inspector.post(`/api/requests/${ours.id}/events`).send({ type: 'satisfy_condition', version, conditionId: item.condition.id, evidenceAttachmentId: evidenceId, comment });

    const report = await upload(pdf, 'set-time report.pdf');
    expect(report).toMatchObject({ purpose: 'condition_evidence', sha256: sha256(pdf) });
    // The object itself, read back over the S3 protocol from the fake.
    const [row] = await t.db.select().from(attachments).where(eq(attachments.id, report.id));
    const object = await s3ClientFor(t.env).send(new GetObjectCommand({ Bucket: t.env.S3_BUCKET, Key: row!.objectKey }));
    expect(sha256(Buffer.from(await object.Body!.transformToByteArray()))).toBe(sha256(pdf));

    // Only the field inspector confirms; the version is the one the list gave.
    const notYours = await a.section_engineer.post(`/api/requests/${ours.id}/events`).send({ type: 'satisfy_condition', version: set.request.version, conditionId: set.condition.id, evidenceAttachmentId: report.id, comment: 'Looks fine.' });
    expect(notYours.status).toBe(403);
    const first = await satisfy(set, set.request.version, report.id, 'Set-time test repeated with lot 4; initial set 11.8 h.');
    expect(first.status, first.text).toBe(200);
    expect(first.body.state).toBe('conditions_open');

    // Open only by default; the met one comes back with ?status=all, with who, when, note and evidence.
    const open = ofRequest(await list(a.field_inspector), ours.id);
    expect(open.map((i) => i.condition.id)).toEqual([pump.condition.id]);
    expect(open[0]!.request.version).toBe(first.body.version);
    const all = ofRequest(await list(a.field_inspector, '?status=all'), ours.id);
    expect(all.map((i) => i.condition.seq)).toEqual([1, 2]);
    expect(all[0]!.condition).toMatchObject({
      satisfied: true,
      satisfiedBy: { id: s.members.field_inspector.id, name: s.members.field_inspector.name },
      note: 'Set-time test repeated with lot 4; initial set 11.8 h.',
      evidence: { id: report.id, fileName: 'set-time report.pdf', contentType: 'application/pdf' },
    });
    expect(Date.parse(all[0]!.condition.satisfiedAt!)).toBeGreaterThan(Date.parse(all[0]!.approvedAt!));

    // A version someone else has moved past is refused, and nothing is marked.
    const pumpPhoto = await upload(photo, 'standby pump.jpg');
    const stale = await satisfy(pump, set.request.version, pumpPhoto.id, 'Standby pump on site.');
    expect(stale.status).toBe(409);
    expect(ofRequest(await list(a.field_inspector), ours.id)).toHaveLength(1);

    const last = await satisfy(pump, open[0]!.request.version, pumpPhoto.id, 'Standby pump on site, checked running at 6:40.');
    expect(last.status, last.text).toBe(200);
    expect(last.body.state).toBe('closed');
    expect(ofRequest(await list(a.field_inspector), ours.id)).toEqual([]);
    const met = ofRequest(await list(a.field_inspector, '?status=all'), ours.id);
    expect(met.every((i) => i.condition.satisfied && i.request.state === 'closed')).toBe(true);
    expect(met[1]!.condition.evidence).toEqual({ id: pumpPhoto.id, fileName: 'standby pump.jpg', contentType: 'image/jpeg' });
    // The thumbnail the screen shows comes from that evidence.
    const preview = await a.field_inspector.get(`/api/attachments/${pumpPhoto.id}/preview`);
    expect(preview.status).toBe(200);
    expect(preview.headers['content-type']).toBe('image/jpeg');
  });

  it('keeps a stranger to the project out of the evidence and the move', async () => {
    const fresh = await requestAt(t, s, a, 'conditions_open');
    const upload = await o.field_inspector.post(`/api/requests/${fresh.id}/attachments?purpose=condition_evidence`).attach('files', await samplePhoto(), 'x.jpg');
    expect(upload.status).toBe(404);
    expect(ofRequest(await list(o.field_inspector, '?status=all'), fresh.id)).toEqual([]);
  });
});
