// The object store stops while a large file is on its way: the uploader is told 503 and nothing is
// kept (no row, no object). Once the store is back the same file goes up, once.
import { createHash } from 'node:crypto';
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import { count, eq } from 'drizzle-orm';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachments } from '../../db/schema';
import { startS3Fake, type S3Fake } from '../../docker-free-scripts/fakes/s3Fake';
import { buildTestApp, createScenario, s3ClientFor, signIn, type TestApp } from '../support/apiHarness';
import { faultTally } from '../support/faultTally';
import { freePort } from '../support/freePort';
import { otherDeviationBody } from '../support/requestFixtures';
import { pdfOfSize } from '../support/sampleFiles';
import { fakesDir, testBucket } from '../support/testSettings';

const tally = faultTally('fault: s3 down');
const storeDir = join(fakesDir('api'), 's3-faults');

// Bytes the fake has written so far, parts of unfinished multipart uploads included.
function bytesIn(dir: string): number {
  let total = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true, recursive: true })) {
    if (entry.isFile()) total += statSync(join(entry.parentPath, entry.name)).size;
  }
  return total;
}

describe('the object store stopped during an upload', () => {
  let fake: S3Fake | null = null;
  let port: number;
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  beforeAll(async () => {
    port = await freePort();
    fake = await startS3Fake({ port, directory: storeDir, bucket: testBucket });
    t = buildTestApp({ S3_ENDPOINT: fake.endpoint });
    s = await createScenario(t.db);
  });
  afterAll(async () => {
    tally.record('the fake closed once the first 8 MB part of a 20 MB file was stored, then started again');
    await t?.close();
    await fake?.close();
  });

  it('answers 503 and keeps nothing, then takes the same file once the store is back', () =>
    tally.attempt(async () => {
      const agent = await signIn(t, s.contractor.email);
      const id = (await agent.post('/api/requests').send(otherDeviationBody(s.project.id))).body.id;
      const rowsOf = async () => (await t.db.select({ n: count() }).from(attachments).where(eq(attachments.requestId, id)))[0]!.n;
      const objectsOf = async () =>
        (await s3ClientFor(t.env).send(new ListObjectsV2Command({ Bucket: testBucket, Prefix: `projects/${s.project.id}/requests/${id}/` }))).KeyCount ?? 0;
      const file = pdfOfSize(20 * 1024 * 1024);
      const before = bytesIn(storeDir);

      const upload = agent.post(`/api/requests/${id}/attachments`).attach('files', file, 'plan set.pdf').timeout(60_000).then((r) => r);
      // Stop the store once the first part has landed, while the rest is still on its way.
      const deadline = Date.now() + 30_000;
      while (bytesIn(storeDir) - before < 8 * 1024 * 1024 && Date.now() < deadline) await sleep(25);
      const stored = bytesIn(storeDir) - before;
      const stopped = fake!.close();
      fake = null;
      const res = await upload;
      await stopped;

      expect(stored, 'the store stopped after the first part, not before the upload').toBeGreaterThanOrEqual(8 * 1024 * 1024);
      expect(res.status, res.text).toBe(503);
      expect(res.body.error).toMatchObject({ code: 'storage_unavailable', message: expect.stringMatching(/nothing was saved/i) });
      expect(await rowsOf()).toBe(0);
      const health = await agent.get('/api/health');
      expect([health.status, health.body.s3]).toEqual([503, 'down']);

      fake = await startS3Fake({ port, directory: storeDir, bucket: testBucket });
      expect(await objectsOf(), 'no object kept from the cut upload').toBe(0);
      const again = await agent.post(`/api/requests/${id}/attachments`).attach('files', file, 'plan set.pdf').timeout(60_000);
      expect(again.status, again.text).toBe(201);
      expect(again.body[0].sha256).toBe(createHash('sha256').update(file).digest('hex'));
      const rows = await rowsOf();
      const objects = await objectsOf();
      tally.lose(Math.abs(rows - 1) + Math.abs(objects - 1));
      expect([rows, objects]).toEqual([1, 1]);
      expect((await agent.get('/api/health')).body.s3).toBe('up');
    }), 120_000);
});
