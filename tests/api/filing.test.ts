// Filing a request: the rows, the stored file, the queued and delivered mail, and every refusal
// leaving nothing behind.
import { createHash } from 'node:crypto';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachments, changeRequests, mailOutbox, trailEvents } from '../../db/schema';
import { uploadLimits } from '../../shared/requests/filing';
import { buildTestApp, createScenario, signIn, waitForMail, type TestApp } from '../support/apiHarness';

const drawing = Buffer.from('%PDF-1.4\n% marked-up plan sheet S-4, construction joint moved 6 ft toward abutment 1\n%%EOF\n');
const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

describe('POST /api/requests', () => {
  let t: TestApp;
  let scenario: Awaited<ReturnType<typeof createScenario>>;
  let s3: S3Client;

  beforeAll(async () => {
    t = buildTestApp();
    scenario = await createScenario(t.db);
    s3 = new S3Client({
      endpoint: t.env.S3_ENDPOINT,
      region: t.env.S3_REGION,
      forcePathStyle: true,
      credentials: { accessKeyId: t.env.S3_ACCESS_KEY_ID, secretAccessKey: t.env.S3_SECRET_ACCESS_KEY },
    });
  });
  afterAll(() => t.close());

  async function rowsOfProject(projectId: string) {
    const [requests] = await t.db.select({ n: count() }).from(changeRequests).where(eq(changeRequests.projectId, projectId));
    const [files] = await t.db
      .select({ n: count() })
      .from(attachments)
      .innerJoin(changeRequests, eq(changeRequests.id, attachments.requestId))
      .where(eq(changeRequests.projectId, projectId));
    const objects = await s3.send(new ListObjectsV2Command({ Bucket: t.env.S3_BUCKET, Prefix: `projects/${projectId}/` }));
    return { requests: requests!.n, attachments: files!.n, objects: objects.KeyCount ?? 0 };
  }

  it('files a request with its attachment, a first trail event and mail to the section engineer', async () => {
    const contractor = await signIn(t, scenario.contractor.email);
    const res = await contractor
      .post('/api/requests')
      .field('projectId', scenario.project.id)
      .field('title', 'Move construction joint CJ-2 toward abutment 1')
      .field('reason', 'The pump truck reach limits the second placement; the joint moves 6 ft.')
      .attach('files', drawing, { filename: 'S-4 marked up.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(201);
    expect(res.body.number).toBe(`${scenario.project.code}-001`);
    expect(res.body.state).toBe('section_review');
    expect(res.body.attachments).toHaveLength(1);
    expect(res.body.attachments[0]).toMatchObject({ fileName: 'S-4 marked up.pdf', sizeBytes: drawing.length, sha256: sha256(drawing) });

    const [trail] = await t.db.select().from(trailEvents).where(eq(trailEvents.requestId, res.body.id));
    expect(trail).toMatchObject({ seq: 1, eventType: 'filed', stateBefore: null, stateAfter: 'section_review', actorId: scenario.contractor.id, actorRole: 'contractor' });

    // The stored object is byte-for-byte the upload, read back through the authorised route.
    const download = await contractor.get(`/api/attachments/${res.body.attachments[0].id}/content`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(download.status).toBe(200);
    expect(sha256(download.body as Buffer)).toBe(sha256(drawing));

    const mail = await waitForMail(t.env, scenario.sectionEngineer.email);
    expect(mail).toHaveLength(1);
    expect(mail[0]!.subject).toContain(res.body.number);
    expect(mail[0]!.text).toContain(`/requests/${res.body.id}`);
    const [queued] = await t.db.select().from(mailOutbox).where(eq(mailOutbox.requestId, res.body.id));
    expect(queued?.status).toBe('sent');

    // The section engineer finds it waiting at their desk; the contractor does not.
    const engineer = await signIn(t, scenario.sectionEngineer.email);
    const desk = await engineer.get('/api/requests?desk=mine');
    expect(desk.body.map((r: { id: string }) => r.id)).toContain(res.body.id);
    const contractorDesk = await contractor.get('/api/requests?desk=mine');
    expect(contractorDesk.body.map((r: { id: string }) => r.id)).not.toContain(res.body.id);
  });

  it('numbers requests of one project in sequence even when filed at the same moment', async () => {
    const contractor = await signIn(t, scenario.contractor.email);
    const file = (i: number) =>
      contractor.post('/api/requests').send({ projectId: scenario.project.id, title: `Parallel filing ${i}`, reason: 'Filed concurrently to test numbering.' });
    const results = await Promise.all([1, 2, 3, 4].map(file));
    expect(results.map((r) => r.status)).toEqual([201, 201, 201, 201]);
    const numbers = new Set(results.map((r) => r.body.number));
    expect(numbers.size).toBe(4);
  });

  describe('refusals leave nothing written', () => {
    async function expectRefused(send: (agent: Awaited<ReturnType<typeof signIn>>) => Promise<{ status: number; body: { error?: { code: string; message: string; fields?: Record<string, string> } } }>, status: number) {
      const agent = await signIn(t, scenario.contractor.email);
      const before = await rowsOfProject(scenario.project.id);
      const res = await send(agent);
      expect(res.status).toBe(status);
      expect(res.body.error?.message).toEqual(expect.any(String));
      expect(await rowsOfProject(scenario.project.id)).toEqual(before);
      return res.body.error!;
    }

    it('a missing title gets 400 naming the field', async () => {
      const error = await expectRefused(
        (a) => a.post('/api/requests').field('projectId', scenario.project.id).field('reason', 'Long enough reason text.').attach('files', drawing, 'a.pdf'),
        400,
      );
      expect(error.fields?.title).toBeDefined();
    });

    it('an empty body gets 400', async () => {
      const error = await expectRefused((a) => a.post('/api/requests'), 400);
      expect(error.code).toBe('empty_body');
    });

    it('an unknown field gets 400 naming it', async () => {
      const error = await expectRefused(
        (a) => a.post('/api/requests').send({ projectId: scenario.project.id, title: 'A good title', reason: 'A long enough reason.', state: 'closed' }),
        400,
      );
      expect(error.fields?.state).toBe('This field is not accepted here.');
    });

    it('a file over the size limit gets 413', async () => {
      const tooBig = Buffer.alloc(uploadLimits.maxFileBytes + 1, 0x20);
      const error = await expectRefused(
        (a) =>
          a
            .post('/api/requests')
            .field('projectId', scenario.project.id)
            .field('title', 'Oversized drawing set')
            .field('reason', 'The whole plan set scanned at high resolution.')
            .attach('files', tooBig, 'plans.pdf'),
        413,
      );
      expect(error.code).toBe('limit_file_size');
    });

    it('an empty file gets 400', async () => {
      const error = await expectRefused(
        (a) =>
          a
            .post('/api/requests')
            .field('projectId', scenario.project.id)
            .field('title', 'Empty photo')
            .field('reason', 'The camera saved nothing.')
            .attach('files', Buffer.alloc(0), 'photo.jpg'),
        400,
      );
      expect(error.code).toBe('empty_file');
    });

    it('malformed JSON gets 400', async () => {
      const error = await expectRefused((a) => a.post('/api/requests').set('content-type', 'application/json').send('{"title":'), 400);
      expect(error.code).toBe('malformed_body');
    });

    it('a project the contractor is not a member of gets 404', async () => {
      await expectRefused(
        (a) => a.post('/api/requests').send({ projectId: scenario.otherProject.id, title: 'Not my project', reason: 'Trying another firm’s bridge.' }),
        404,
      );
    });

    it('a reviewer cannot file: only the contractor files', async () => {
      const engineer = await signIn(t, scenario.sectionEngineer.email);
      const res = await engineer.post('/api/requests').send({ projectId: scenario.project.id, title: 'Reviewer filing', reason: 'Should not be allowed.' });
      expect(res.status).toBe(403);
    });

    it('an unreachable object store gets 503 and no rows', async () => {
      const broken = buildTestApp({ S3_ENDPOINT: 'http://127.0.0.1:9' });
      try {
        const agent = await signIn(broken, scenario.contractor.email);
        const before = await rowsOfProject(scenario.project.id);
        const res = await agent
          .post('/api/requests')
          .field('projectId', scenario.project.id)
          .field('title', 'Filed while storage is down')
          .field('reason', 'The store is unreachable.')
          .attach('files', drawing, 'a.pdf');
        expect(res.status).toBe(503);
        expect(res.body.error.code).toBe('storage_unavailable');
        expect(await rowsOfProject(scenario.project.id)).toEqual(before);
      } finally {
        await broken.close();
      }
    });
  });

  it('keeps the mail when SMTP is down and delivers it once SMTP is back', async () => {
    const noSmtp = buildTestApp({ SMTP_PORT: '9' });
    try {
      const agent = await signIn(noSmtp, scenario.contractor.email);
      const res = await agent.post('/api/requests').send({ projectId: scenario.project.id, title: 'Filed while mail is down', reason: 'SMTP is unreachable right now.' });
      expect(res.status).toBe(201);
      await noSmtp.outbox.kick();
      const [held] = await t.db.select().from(mailOutbox).where(eq(mailOutbox.requestId, res.body.id));
      expect(held).toMatchObject({ status: 'pending', attempts: 1 });
      expect(held?.lastError).toBeTruthy();

      // Make it due now and let a dispatcher with a working SMTP connection deliver it.
      await t.db.update(mailOutbox).set({ nextAttemptAt: new Date(0) }).where(eq(mailOutbox.requestId, res.body.id));
      await t.outbox.kick();
      const [sent] = await t.db.select().from(mailOutbox).where(eq(mailOutbox.requestId, res.body.id));
      expect(sent?.status).toBe('sent');
      const caught = await waitForMail(t.env, scenario.sectionEngineer.email);
      expect(caught.some((m) => m.subject.includes(res.body.number))).toBe(true);
    } finally {
      await noSmtp.close();
    }
  });
});

describe('reading requests', () => {
  let t: TestApp;
  let scenario: Awaited<ReturnType<typeof createScenario>>;
  beforeAll(async () => {
    t = buildTestApp();
    scenario = await createScenario(t.db);
  });
  afterAll(() => t.close());

  it('a contractor of another project can neither read the request nor download its files', async () => {
    const contractor = await signIn(t, scenario.contractor.email);
    const filed = await contractor
      .post('/api/requests')
      .field('projectId', scenario.project.id)
      .field('title', 'Substitute compression seal at pier 2')
      .field('reason', 'The specified seal is back-ordered twelve weeks.')
      .attach('files', drawing, 'seal data.pdf');
    expect(filed.status).toBe(201);

    const outsider = await signIn(t, scenario.outsider.email);
    expect((await outsider.get(`/api/requests/${filed.body.id}`)).status).toBe(404);
    expect((await outsider.get(`/api/attachments/${filed.body.attachments[0].id}/content`)).status).toBe(404);
    const list = await outsider.get('/api/requests');
    expect(list.body.map((r: { id: string }) => r.id)).not.toContain(filed.body.id);

    const inspector = await signIn(t, scenario.fieldInspector.email);
    expect((await inspector.get(`/api/requests/${filed.body.id}`)).status).toBe(200);
  });

  it('answers 404, not 500, for an id that is not a uuid', async () => {
    const contractor = await signIn(t, scenario.contractor.email);
    expect((await contractor.get('/api/requests/not-an-id')).status).toBe(404);
    expect((await contractor.get('/api/attachments/../content')).status).toBe(404);
  });
});
