// Made in the background after the engineer of record decides: the PDF is stored as an
// attachment of the request and its link mailed to the contractor and the section engineers.
// Queued in the decision's own transaction, so no decision goes without its record.
import { createHash, randomUUID } from 'node:crypto';
import { and, eq, sql } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { attachments } from '../../db/schema';
import { queueMail } from '../mail/mailQueue';
import { requestRecord } from '../requests/readService';
import { membersWithRole, userById } from '../requests/requestRepository';
import type { ObjectStore } from '../storage/objectStore';
import { verifyTrail, type RecordedAt } from '../trail/trailChain';
import { objectKeyFor } from '../requests/attachmentService';
import { renderDecisionRecord } from './decisionRecord';

export async function queueDecisionRecord(tx: Transaction, requestId: string, decidedById: string): Promise<void> {
  await tx.execute(
    sql`select graphile_worker.add_job('decision_record', json_build_object('requestId', ${requestId}::text, 'decidedById', ${decidedById}::text), max_attempts => 25, job_key => ${`decision-record:${requestId}`})`,
  );
}

// `when.at` only from the demo seed, which makes each record on the day of its invented decision.
export async function produceDecisionRecord(
  deps: { db: Database; store: ObjectStore; publicUrl: string },
  requestId: string,
  decidedById: string,
  when: RecordedAt = {},
): Promise<void> {
  const { db, store } = deps;
  const [existing] = await db.select({ id: attachments.id }).from(attachments).where(and(eq(attachments.requestId, requestId), eq(attachments.purpose, 'decision_record')));
  if (existing) return;
  const request = await requestRecord(db, requestId);
  if (!request) return;
  const chain = await verifyTrail(db, requestId);
  const pdf = await renderDecisionRecord({
    request,
    chain: chain.ok ? chain : { ok: false, events: request.trail.length, lastHash: request.trail.at(-1)?.hash ?? '' },
    generatedAt: when.at ?? new Date(),
  });
  const key = objectKeyFor(request.project.id, requestId, request.currentRevision);
  await store.put(key, pdf, 'application/pdf', { 'original-name': `${request.number} decision record.pdf` });
  const attachmentId = randomUUID();
  try {
    await db.transaction(async (tx) => {
      await tx.insert(attachments).values({
        id: attachmentId,
        requestId,
        revision: request.currentRevision,
        purpose: 'decision_record',
        objectKey: key,
        fileName: `${request.number} decision record.pdf`,
        contentType: 'application/pdf',
        sizeBytes: pdf.length,
        sha256: createHash('sha256').update(pdf).digest('hex'),
        uploadedById: decidedById,
        ...(when.at ? { uploadedAt: when.at } : {}),
      });
      const filer = await userById(tx, request.filedBy.id);
      const engineers = await membersWithRole(tx, request.project.id, 'section_engineer');
      const people = [...(filer ? [filer] : []), ...engineers];
      await queueMail(
        tx,
        people.map((p) => ({
          idempotencyKey: `decision-record:${requestId}:${p.email}`,
          to: p.email,
          requestId,
          subject: `${request.number}: decision record ready`,
          text: [
            `Hello ${p.name},`,
            '',
            `The engineer of record has decided request ${request.number}, "${request.title}". The decision record (PDF) is ready:`,
            `${deps.publicUrl}/api/attachments/${attachmentId}/content`,
            '',
            `The request: ${deps.publicUrl}/requests/${requestId}`,
          ].join('\n'),
        })),
      );
    });
  } catch (err) {
    await store.remove(key).catch(() => undefined);
    throw err;
  }
}
