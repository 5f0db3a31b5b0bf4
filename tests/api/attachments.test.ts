// Attachments through the S3 protocol: round trips with checksums, every refusal, the store failing
// mid-upload, previews, and the decision record PDF read back.
import { createHash } from 'node:crypto';
import { createServer, Socket, type Server } from 'node:net';
import { join } from 'node:path';
import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import { and, count, eq, sql } from 'drizzle-orm';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachments } from '../../db/schema';
import { startS3Fake, type S3Fake } from '../../docker-free-scripts/fakes/s3Fake';
import { buildTestApp, createScenario, s3ClientFor, signIn, waitForMail, type TestApp } from '../support/apiHarness';
import { binary, pdfText } from '../support/documents';
import { agentsFor, otherDeviationBody, requestAt } from '../support/requestFixtures';
import { pdfOfSize, samplePdf, samplePhoto, samplePng } from '../support/sampleFiles';
import { fakesDir, testBucket } from '../support/testSettings';
import { privateDatabase } from '../support/privateDatabase';

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');
// An ISO base-media header with the 'heic' brand, as phones write it (ISO/IEC 23008-12).
const heicHeader = Buffer.concat([Buffer.from([0, 0, 0, 0x18]), Buffer.from('ftypheic'), Buffer.from([0, 0, 0, 0]), Buffer.from('mif1heic'), Buffer.alloc(64)]);

describe('attachments', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  let draftId: string;
  beforeAll(async () => {
    t = buildTestApp();
    await t.startJobs();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    draftId = (await a.contractor.post('/api/requests').send(otherDeviationBody(s.project.id))).body.id;
  });
  afterAll(() => t.close());

  const upload = (name: string, bytes: Buffer, id = draftId) => a.contractor.post(`/api/requests/${id}/attachments`).attach('files', bytes, name);
  const rowsOf = async (id: string) => (await t.db.select({ n: count() }).from(attachments).where(eq(attachments.requestId, id)))[0]!.n;
  const objectsOf = async (id: string) =>
    (await s3ClientFor(t.env).send(new ListObjectsV2Command({ Bucket: t.env.S3_BUCKET, Prefix: `projects/${s.project.id}/requests/${id}/` }))).KeyCount ?? 0;

  it('stores PDF, JPEG, PNG, WebP and HEIC files byte for byte, typed by their content', async () => {
    const files: [string, Buffer, string][] = [
      ['sheet.pdf', await samplePdf(), 'application/pdf'],
      ['deck.jpg', await samplePhoto(), 'image/jpeg'],
      ['detail.png', await samplePng(), 'image/png'],
      ['joint.webp', await sharp({ create: { width: 20, height: 20, channels: 3, background: '#aaa' } }).webp().toBuffer(), 'image/webp'],
      ['seal.heic', heicHeader, 'image/heic'],
      // The name says text; the bytes say PDF, and the bytes win.
      ['set-time report.txt', await samplePdf('ASTM C403 set-time report'), 'application/pdf'],
    ];
    for (const [name, bytes, type] of files) {
      const res = await upload(name, bytes);
      expect(res.status, `${name}: ${res.text}`).toBe(201);
      expect(res.body[0]).toMatchObject({ fileName: name, contentType: type, sizeBytes: bytes.length, sha256: sha256(bytes) });
      // Read back by the auditor: a draft's files are the contractor's and the auditors' only.
      const back = await a.auditor.get(`/api/attachments/${res.body[0].id}/content`).buffer(true).parse(binary);
      expect(back.status).toBe(200);
      expect(sha256(back.body as Buffer)).toBe(sha256(bytes));
      expect(back.headers['content-type']).toBe(type);
      expect(back.headers['content-disposition']).toBe(`inline; filename*=UTF-8''${encodeURIComponent(name)}`);
      const saved = await a.auditor.get(`/api/attachments/${res.body[0].id}/content?download=1`).buffer(true).parse(binary);
      expect(saved.headers['content-disposition']).toBe(`attachment; filename*=UTF-8''${encodeURIComponent(name)}`);
      expect(sha256(saved.body as Buffer)).toBe(sha256(bytes));
    }
  });

  it('keeps the key layout of our own and the file name as metadata only, without any path', async () => {
    const res = await upload('../../etc/passwd.pdf', await samplePdf());
    const [row] = await t.db.select().from(attachments).where(eq(attachments.id, res.body[0].id));
    expect(row!.objectKey).toMatch(new RegExp(`^projects/${s.project.id}/requests/${draftId}/rev-1/[0-9a-f-]{36}$`));
    expect(row!.fileName).toBe('passwd.pdf');
  });

  it('refuses what it does not take: 415 for other types, 413 over the limits, 400 for empty', async () => {
    const before = { rows: await rowsOf(draftId), objects: await objectsOf(draftId) };
    const refusals: [string, Buffer, number, string][] = [
      ['notes.pdf', Buffer.from('<html><body>not a pdf</body></html>'), 415, 'unsupported_type'],
      ['tool.exe', Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200)]), 415, 'unsupported_type'],
      ['clip.mp3', Buffer.concat([Buffer.from('ID3'), Buffer.from([4, 0, 0, 0, 0, 0]), Buffer.alloc(200)]), 415, 'unsupported_type'],
      ['empty.jpg', Buffer.alloc(0), 400, 'empty_file'],
      ['huge.pdf', pdfOfSize(25 * 1024 * 1024 + 1), 413, 'limit_file_size'],
    ];
    for (const [name, bytes, status, code] of refusals) {
      const res = await upload(name, bytes);
      expect(res.status, name).toBe(status);
      expect(res.body.error.code, name).toBe(code);
    }
    // One good file and one bad one in the same upload: neither is kept.
    const mixed = await a.contractor.post(`/api/requests/${draftId}/attachments`).attach('files', await samplePdf(), 'good.pdf').attach('files', Buffer.from('plain text'), 'bad.pdf');
    expect(mixed.status).toBe(415);
    expect({ rows: await rowsOf(draftId), objects: await objectsOf(draftId) }).toEqual(before);
  });

  it('holds each request to its total, across uploads', async () => {
    const small = buildTestApp({ UPLOAD_MAX_REQUEST_BYTES: String(300 * 1024) });
    try {
      const agent = await signIn(small, s.contractor.email);
      const id = (await agent.post('/api/requests').send(otherDeviationBody(s.project.id))).body.id;
      expect((await agent.post(`/api/requests/${id}/attachments`).attach('files', pdfOfSize(200 * 1024), 'a.pdf')).status).toBe(201);
      const over = await agent.post(`/api/requests/${id}/attachments`).attach('files', pdfOfSize(200 * 1024), 'b.pdf');
      expect(over.status).toBe(413);
      expect(over.body.error.code).toBe('request_total_too_large');
      expect(await rowsOf(id)).toBe(1);
      expect(await objectsOf(id)).toBe(1);
    } finally {
      await small.close();
    }
  });

  it('answers 503 and keeps nothing when the store goes away in the middle of an upload', async () => {
    const port = Number(process.env.TEST_API_S3_PORT) + 20;
    const proxyPort = port + 1;
    const fake: S3Fake = await startS3Fake({ port, directory: join(fakesDir('api'), 's3-midway'), bucket: testBucket });
    // A TCP relay in front of the store that cuts every connection once 3 MB have gone through.
    const sockets = new Set<Socket>();
    let relayed = 0;
    const relay: Server = createServer((client) => {
      const upstream = new Socket().connect(port, '127.0.0.1');
      sockets.add(client).add(upstream);
      client.on('data', (chunk: Buffer) => {
        relayed += chunk.length;
        if (relayed > 3 * 1024 * 1024) {
          relay.close();
          for (const s of sockets) s.destroy();
          return;
        }
        upstream.write(chunk);
      });
      upstream.on('data', (chunk: Buffer) => client.write(chunk));
      client.on('error', () => upstream.destroy());
      upstream.on('error', () => client.destroy());
    });
    await new Promise<void>((r) => relay.listen(proxyPort, '127.0.0.1', () => r()));
    const cut = buildTestApp({ S3_ENDPOINT: `http://127.0.0.1:${proxyPort}` });
    try {
      const agent = await signIn(cut, s.contractor.email);
      const id = (await agent.post('/api/requests').send(otherDeviationBody(s.project.id))).body.id;
      const res = await agent.post(`/api/requests/${id}/attachments`).attach('files', pdfOfSize(20 * 1024 * 1024), 'plan set.pdf');
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('storage_unavailable');
      expect(await rowsOf(id)).toBe(0);
      const left = await s3ClientFor({ ...t.env, S3_ENDPOINT: fake.endpoint }).send(new ListObjectsV2Command({ Bucket: testBucket, Prefix: `projects/${s.project.id}/requests/${id}/` }));
      expect(left.KeyCount ?? 0).toBe(0);
    } finally {
      await cut.close();
      relay.close();
      await fake.close();
    }
  });

  it('makes a small preview of a photo, and none of a PDF', async () => {
    const photo = await samplePhoto(1600, 1200);
    const res = await upload('girder.jpg', photo);
    const preview = await a.auditor.get(`/api/attachments/${res.body[0].id}/preview`).buffer(true).parse(binary);
    expect(preview.status).toBe(200);
    const meta = await sharp(preview.body as Buffer).metadata();
    expect(meta.format).toBe('jpeg');
    expect(Math.max(meta.width!, meta.height!)).toBe(640);
    const pdf = await upload('sheet.pdf', await samplePdf());
    expect((await a.contractor.get(`/api/attachments/${pdf.body[0].id}/preview`)).status).toBe(404);
    const outsider = await signIn(t, s.outsider.email);
    expect((await outsider.get(`/api/attachments/${res.body[0].id}/preview`)).status).toBe(404);
  });

  it('lets the contractor remove a draft’s file, and nobody a submitted one', async () => {
    const res = await upload('wrong sheet.pdf', await samplePdf());
    const removed = await a.contractor.delete(`/api/requests/${draftId}/attachments/${res.body[0].id}`);
    expect(removed.status).toBe(204);
    expect((await a.contractor.get(`/api/attachments/${res.body[0].id}/content`)).status).toBe(404);
    expect((await a.section_engineer.delete(`/api/requests/${draftId}/attachments/${res.body[0].id}`)).status).toBe(404);
  });

  it('refuses uploads from the wrong desk or at the wrong time', async () => {
    // A draft does not exist for the agency's desks; the auditor sees it but does not file.
    expect((await a.section_engineer.post(`/api/requests/${draftId}/attachments`).attach('files', await samplePdf(), 'x.pdf')).status).toBe(404);
    expect((await a.auditor.post(`/api/requests/${draftId}/attachments`).attach('files', await samplePdf(), 'x.pdf')).status).toBe(403);
    expect((await a.field_inspector.post(`/api/requests/${draftId}/attachments?purpose=condition_evidence`).attach('files', await samplePhoto(), 'x.jpg')).status).toBe(404);
    expect((await a.contractor.post(`/api/requests/${draftId}/attachments?purpose=information_response`).attach('files', await samplePdf(), 'x.pdf')).status).toBe(409);
    expect((await a.contractor.post(`/api/requests/${draftId}/attachments?purpose=secret`).attach('files', await samplePdf(), 'x.pdf')).status).toBe(400);
  });

  it('produces the decision record as a PDF attachment and mails its link', async () => {
    const { id, version } = await requestAt(t, s, a, 'eor_review');
    const decided = await a.engineer_of_record.post(`/api/requests/${id}/events`).send({ type: 'approve', version: version(), comment: 'Approved as proposed.' });
    expect(decided.status).toBe(200);
    await expect
      .poll(async () => (await t.db.select().from(attachments).where(and(eq(attachments.requestId, id), eq(attachments.purpose, 'decision_record')))).length, { timeout: 20_000 })
      .toBe(1);
    const detail = (await a.contractor.get(`/api/requests/${id}`)).body;
    const record = detail.attachments.find((x: { purpose: string }) => x.purpose === 'decision_record');
    const pdf = await a.contractor.get(`/api/attachments/${record.id}/content`).buffer(true).parse(binary);
    expect(pdf.status).toBe(200);
    const text = await pdfText(pdf.body as Buffer);
    expect(text).toContain(`Decision record ${detail.number}`);
    expect(text).toContain('Approved');
    expect(text).toContain('Approved as proposed.');
    expect(text).toContain(detail.trail.at(-1).hash);
    expect(text).toMatch(/do not replace the engineer of record/i);
    const mail = await waitForMail(t.env, s.members.contractor.email);
    expect(mail.some((m) => m.subject === `${detail.number}: decision record ready` && m.text.includes(`/api/attachments/${record.id}/content`))).toBe(true);
  });
});

describe('an attachment row that cannot be written', () => {
  it('takes its stored object away again, so no file is left without its row', async () => {
    const url = await privateDatabase('spanrelay_api_rowfail_test');
    const t = buildTestApp({ DATABASE_URL: url });
    try {
      const s = await createScenario(t.db);
      const agent = await signIn(t, s.contractor.email);
      const id = (await agent.post('/api/requests').send(otherDeviationBody(s.project.id))).body.id;
      // The database refuses the row after the object is already in the store.
      await t.db.execute(sql.raw(`create function refuse_attachment() returns trigger language plpgsql as $$ begin raise exception 'disk full'; end $$;
        create trigger refuse_attachment before insert on attachments for each row execute function refuse_attachment();`));
      const res = await agent.post(`/api/requests/${id}/attachments`).attach('files', await samplePdf(), 'sheet.pdf');
      expect(res.status).toBe(500);
      const left = await s3ClientFor(t.env).send(new ListObjectsV2Command({ Bucket: t.env.S3_BUCKET, Prefix: `projects/${s.project.id}/requests/${id}/` }));
      expect(left.KeyCount ?? 0).toBe(0);
    } finally {
      await t.close();
    }
  });
});
