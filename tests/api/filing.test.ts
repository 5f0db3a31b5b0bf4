// Filing: a draft, its attachments, submission, and every refusal leaving nothing half-written.
import { createHash } from 'node:crypto';
import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachments, changeRequests, requestRevisions } from '../../db/schema';
import { uploadLimits } from '../../shared/requests/filing';
import { buildTestApp, createScenario, s3ClientFor, signIn, waitForMail, type TestApp } from '../support/apiHarness';
import { otherDeviationBody } from '../support/requestFixtures';
import { pdfOfSize, samplePdf } from '../support/sampleFiles';

let drawing: Buffer;
const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

describe('filing a request', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  beforeAll(async () => {
    drawing = await samplePdf('Sheet S-12: drain outlet moved 18 in');
    t = buildTestApp();
    await t.startJobs();
    s = await createScenario(t.db);
  });
  afterAll(() => t.close());

  async function rowsOfProject(projectId: string) {
    const [requests] = await t.db.select({ n: count() }).from(changeRequests).where(eq(changeRequests.projectId, projectId));
    const [files] = await t.db
      .select({ n: count() })
      .from(attachments)
      .innerJoin(changeRequests, eq(changeRequests.id, attachments.requestId))
      .where(eq(changeRequests.projectId, projectId));
    const objects = await s3ClientFor(t.env).send(new ListObjectsV2Command({ Bucket: t.env.S3_BUCKET, Prefix: `projects/${projectId}/` }));
    return { requests: requests!.n, attachments: files!.n, objects: objects.KeyCount ?? 0 };
  }

  it('drafts, attaches a drawing, submits, and mails the section engineer', async () => {
    const contractor = await signIn(t, s.contractor.email);
    const body = otherDeviationBody(s.project.id);
    // A draft may be incomplete: only the type and project are needed to start.
    const started = await contractor.post('/api/requests').send({ type: 'other_deviation', projectId: s.project.id, title: 'Drain outlet' });
    expect(started.status).toBe(201);
    expect(started.body).toMatchObject({ state: 'drafting', number: `${s.project.code}-001`, currentRevision: 1, version: 1 });
    expect(started.body.availableActions).toEqual(['submit', 'withdraw']);
    const id = started.body.id;

    const incomplete = await contractor.post(`/api/requests/${id}/events`).send({ type: 'submit', version: 1 });
    expect(incomplete.status).toBe(400);
    expect(Object.keys(incomplete.body.error.fields)).toEqual(expect.arrayContaining(['reason', 'proposedChange', 'neededBy', 'location']));

    const saved = await contractor.put(`/api/requests/${id}/draft`).send({ version: 1, body });
    expect(saved.status).toBe(200);
    expect(saved.body.version).toBe(2);

    const uploaded = await contractor.post(`/api/requests/${id}/attachments`).attach('files', drawing, { filename: 'S-12 marked up.pdf', contentType: 'application/pdf' });
    expect(uploaded.status).toBe(201);
    expect(uploaded.body[0]).toMatchObject({ fileName: 'S-12 marked up.pdf', sizeBytes: drawing.length, sha256: sha256(drawing), revision: 1 });

    const submitted = await contractor.post(`/api/requests/${id}/events`).send({ type: 'submit', version: 2 });
    expect(submitted.status).toBe(200);
    expect(submitted.body).toMatchObject({ state: 'section_review', version: 3 });
    expect(submitted.body.trail.map((e: { eventType: string }) => e.eventType)).toEqual(['created', 'submit']);
    expect(submitted.body.trail[1].payload.body.title).toBe(body.title);
    expect(submitted.body.trail[1].payload.attachments[0].sha256).toBe(sha256(drawing));

    const download = await contractor
      .get(`/api/attachments/${uploaded.body[0].id}/content`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(sha256(download.body as Buffer)).toBe(sha256(drawing));

    const mail = await waitForMail(t.env, s.sectionEngineer.email);
    expect(mail).toHaveLength(1);
    expect(mail[0]!.subject).toBe(`${started.body.number}: submitted to the section engineer (at your desk)`);
    expect(mail[0]!.text).toContain(`/requests/${id}`);

    const engineer = await signIn(t, s.sectionEngineer.email);
    const desk = await engineer.get('/api/requests?desk=mine');
    expect(desk.body.items.map((r: { id: string }) => r.id)).toContain(id);
    const contractorDesk = await contractor.get('/api/requests?desk=mine');
    expect(contractorDesk.body.items.map((r: { id: string }) => r.id)).not.toContain(id);

    // A submitted revision is on the record: it can no longer be edited, nor its files removed.
    expect((await contractor.put(`/api/requests/${id}/draft`).send({ version: 3, body })).status).toBe(409);
    expect((await contractor.delete(`/api/requests/${id}/attachments/${uploaded.body[0].id}`)).status).toBe(409);
  });

  it('numbers requests of one project in sequence even when started at the same moment', async () => {
    const contractor = await signIn(t, s.contractor.email);
    const results = await Promise.all([1, 2, 3, 4].map((i) => contractor.post('/api/requests').send({ type: 'other_deviation', projectId: s.project.id, title: `Parallel ${i}` })));
    expect(results.map((r) => r.status)).toEqual([201, 201, 201, 201]);
    expect(new Set(results.map((r) => r.body.number)).size).toBe(4);
  });

  describe('refusals leave nothing written', () => {
    let draftId: string;
    beforeAll(async () => {
      const contractor = await signIn(t, s.contractor.email);
      draftId = (await contractor.post('/api/requests').send({ type: 'other_deviation', projectId: s.project.id })).body.id;
    });

    async function expectRefused(send: (agent: Awaited<ReturnType<typeof signIn>>) => PromiseLike<{ status: number; body: any }>, status: number) {
      const agent = await signIn(t, s.contractor.email);
      const before = await rowsOfProject(s.project.id);
      const res = await send(agent);
      expect(res.status).toBe(status);
      expect(res.body.error?.message).toEqual(expect.any(String));
      expect(await rowsOfProject(s.project.id)).toEqual(before);
      return res.body.error as { code: string; fields?: Record<string, string> };
    }

    it('a draft without a type gets 400', async () => {
      await expectRefused((a) => a.post('/api/requests').send({ projectId: s.project.id, title: 'No type' }), 400);
    });
    it('an empty body gets 400', async () => {
      expect((await expectRefused((a) => a.post('/api/requests').send({}), 400)).code).toBe('empty_body');
    });
    it('an unknown field gets 400 naming it', async () => {
      const error = await expectRefused((a) => a.post('/api/requests').send({ type: 'other_deviation', projectId: s.project.id, state: 'closed' }), 400);
      expect(error.fields?.state).toBe('This field is not accepted here.');
    });
    it('a title too short gets 400 naming the field', async () => {
      const error = await expectRefused((a) => a.post('/api/requests').send({ type: 'other_deviation', projectId: s.project.id, title: 'x' }), 400);
      expect(error.fields?.title).toBeDefined();
    });
    it('malformed JSON gets 400', async () => {
      expect((await expectRefused((a) => a.post('/api/requests').set('content-type', 'application/json').send('{"title":'), 400)).code).toBe('malformed_body');
    });
    it('a project the contractor is not on gets 404', async () => {
      await expectRefused((a) => a.post('/api/requests').send({ type: 'other_deviation', projectId: s.otherProject.id }), 404);
    });
    it('a reviewer cannot start a request', async () => {
      const engineer = await signIn(t, s.sectionEngineer.email);
      expect((await engineer.post('/api/requests').send({ type: 'other_deviation', projectId: s.project.id })).status).toBe(403);
    });
    it('a file over the size limit gets 413', async () => {
      const tooBig = pdfOfSize(uploadLimits.maxFileBytes + 1);
      expect((await expectRefused((a) => a.post(`/api/requests/${draftId}/attachments`).attach('files', tooBig, 'plans.pdf'), 413)).code).toBe('limit_file_size');
    });
    it('an empty file gets 400', async () => {
      expect((await expectRefused((a) => a.post(`/api/requests/${draftId}/attachments`).attach('files', Buffer.alloc(0), 'photo.jpg'), 400)).code).toBe('empty_file');
    });
    it('an upload with no file gets 400', async () => {
      expect((await expectRefused((a) => a.post(`/api/requests/${draftId}/attachments`).field('note', 'x'), 400)).code).toBe('invalid_input');
    });
    it('an unreachable object store gets 503 and no rows', async () => {
      const broken = buildTestApp({ S3_ENDPOINT: 'http://127.0.0.1:9' });
      try {
        const agent = await signIn(broken, s.contractor.email);
        const before = await rowsOfProject(s.project.id);
        const res = await agent.post(`/api/requests/${draftId}/attachments`).attach('files', drawing, 'a.pdf');
        expect(res.status).toBe(503);
        expect(res.body.error.code).toBe('storage_unavailable');
        expect(await rowsOfProject(s.project.id)).toEqual(before);
      } finally {
        await broken.close();
      }
    });
    it('a stale version gets 409 and the draft is unchanged', async () => {
      const agent = await signIn(t, s.contractor.email);
      const res = await agent.put(`/api/requests/${draftId}/draft`).send({ version: 99, body: { type: 'other_deviation', projectId: s.project.id, title: 'Changed title' } });
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('stale_version');
      const [rev] = await t.db.select().from(requestRevisions).where(eq(requestRevisions.requestId, draftId));
      expect((rev!.body as { title?: string }).title).toBeUndefined();
    });
  });

  it('a contractor of another project can neither read the request nor download its files', async () => {
    const contractor = await signIn(t, s.contractor.email);
    const created = await contractor.post('/api/requests').send(otherDeviationBody(s.project.id, 'Substitute bearing anchor bolts'));
    const file = await contractor.post(`/api/requests/${created.body.id}/attachments`).attach('files', drawing, 'bolts.pdf');
    const outsider = await signIn(t, s.outsider.email);
    expect((await outsider.get(`/api/requests/${created.body.id}`)).status).toBe(404);
    expect((await outsider.get(`/api/attachments/${file.body[0].id}/content`)).status).toBe(404);
    expect((await outsider.get('/api/requests')).body.items.map((r: { id: string }) => r.id)).not.toContain(created.body.id);
    // Still a draft: the contractor's own, even to the desks of its project.
    expect((await (await signIn(t, s.fieldInspector.email)).get(`/api/requests/${created.body.id}`)).status).toBe(404);
    // Auditors trace every request, whatever project.
    expect((await (await signIn(t, s.outsiders.auditor.email)).get(`/api/requests/${created.body.id}`)).status).toBe(200);
    expect((await contractor.get('/api/requests/not-an-id')).status).toBe(404);
  });
});
