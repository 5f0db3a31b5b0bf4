// Files on a request: who may add which kind, in which state. Objects are stored first; the rows
// are written in one transaction after, and the objects removed again if that fails.
import { randomUUID } from 'node:crypto';
import { eq, sum } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { attachments, attachmentPurposes } from '../../db/schema';
import type { Actor, AttachmentSummary } from '../../shared/requests/types';
import type { Role } from '../../shared/roles';
import { HttpError } from '../http/errors';
import { isProjectMember } from '../projects/projectRepository';
import type { ObjectStore } from '../storage/objectStore';
import type { RecordedAt } from '../trail/trailChain';
import type { StoredUpload } from '../storage/streamingUploadStorage';
import { previewableTypes } from '../storage/acceptedFileTypes';
import sharp from 'sharp';
import { mayReadRequest } from './access';
import { attachmentOfRequest, attachmentWithProject, requestRow, toAttachmentSummary } from './requestRepository';

export type AttachmentPurpose = (typeof attachmentPurposes)[number];
export type UploadPurpose = Exclude<AttachmentPurpose, 'decision_record'>;
export type ReceivedFile = StoredUpload & { originalname: string };

const uploadRules: Record<UploadPurpose, { role: Role; states: string[]; what: string }> = {
  revision: { role: 'contractor', states: ['drafting', 'revising'], what: 'Drawings and documents are added by the contractor while the request is a draft or returned for revision.' },
  information_response: { role: 'contractor', states: ['information_requested'], what: 'Answers to a question are attached by the contractor while the question is open.' },
  federal_concurrence: { role: 'central_office', states: ['central_routing', 'eor_review'], what: 'The federal concurrence letter is attached by central office before the decision.' },
  condition_evidence: { role: 'field_inspector', states: ['conditions_open'], what: 'Evidence is attached by the field inspector while conditions are open.' },
};

export function objectKeyFor(projectId: string, requestId: string, revision: number): string {
  return `projects/${projectId}/requests/${requestId}/rev-${revision}/${randomUUID()}`;
}

// Decided before a byte is read: may this person add this kind of file to this request now?
export async function authorizeUpload(db: Database, actor: Actor, requestId: string, purpose: UploadPurpose) {
  const row = await requestRow(db, requestId);
  if (!row || !(await mayReadRequest(db, actor, row.request))) throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  const rule = uploadRules[purpose];
  if (actor.role !== rule.role || !(await isProjectMember(db, row.request.projectId, actor.id))) throw new HttpError(403, 'not_your_upload', rule.what);
  if (!rule.states.includes(row.request.state)) throw new HttpError(409, 'not_now', rule.what);
  const [held] = await db.select({ bytes: sum(attachments.sizeBytes) }).from(attachments).where(eq(attachments.requestId, requestId));
  return { projectId: row.request.projectId, revision: row.request.currentRevision, usedBytes: Number(held?.bytes ?? 0) };
}

// The objects are already stored; the rows go in together, or the objects are removed again.
export async function recordUploads(
  deps: { db: Database; store: ObjectStore },
  actor: Actor,
  requestId: string,
  revision: number,
  purpose: UploadPurpose,
  files: ReceivedFile[],
  when: RecordedAt = {},
): Promise<AttachmentSummary[]> {
  const removeAll = () => Promise.allSettled(files.map((f) => deps.store.remove(f.key)));
  if (files.length === 0) throw new HttpError(400, 'no_files', 'Choose at least one file to upload.');
  try {
    const rows = await deps.db.transaction(async (tx) =>
      tx
        .insert(attachments)
        .values(
          files.map((f) => ({
            id: randomUUID(),
            requestId,
            revision,
            purpose,
            objectKey: f.key,
            fileName: f.originalname,
            contentType: f.detectedType,
            sizeBytes: f.size,
            sha256: f.sha256,
            uploadedById: actor.id,
            ...(when.at ? { uploadedAt: when.at } : {}),
          })),
        )
        .returning(),
    );
    return rows.map((a) => toAttachmentSummary(a, actor.name));
  } catch (err) {
    await removeAll();
    throw err;
  }
}

// Only a draft's own files can be removed; a submitted revision's are part of the record.
export async function removeDraftAttachment(deps: { db: Database; store: ObjectStore }, actor: Actor, requestId: string, attachmentId: string) {
  const row = await requestRow(deps.db, requestId);
  if (!row || !(await mayReadRequest(deps.db, actor, row.request))) throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  const a = await attachmentOfRequest(deps.db, requestId, attachmentId);
  if (!a) throw new HttpError(404, 'attachment_not_found', 'No attachment of this request has that id.');
  if (actor.role !== 'contractor' || !(await isProjectMember(deps.db, row.request.projectId, actor.id))) {
    throw new HttpError(403, 'not_your_upload', 'Only the contractor removes files from a draft.');
  }
  const draftFile = a.purpose === 'revision' && a.revision === row.request.currentRevision && ['drafting', 'revising'].includes(row.request.state);
  if (!draftFile) throw new HttpError(409, 'attachment_on_record', 'This file belongs to a submitted revision and stays on the record.');
  await deps.db.delete(attachments).where(eq(attachments.id, attachmentId));
  await deps.store.remove(a.objectKey).catch(() => undefined);
}

export async function openAttachment(deps: { db: Database; store: ObjectStore }, actor: Actor, attachmentId: string) {
  const row = await attachmentWithProject(deps.db, attachmentId);
  if (!row || !(await mayReadRequest(deps.db, actor, row))) throw new HttpError(404, 'attachment_not_found', 'No attachment you can see has that id.');
  try {
    return { attachment: row.attachment, object: await deps.store.get(row.attachment.objectKey) };
  } catch {
    throw new HttpError(503, 'storage_unavailable', 'File storage is not reachable right now. Try again shortly.');
  }
}

// A resized JPEG of a photo or image, made once and kept beside the original in the store.
export async function attachmentPreview(deps: { db: Database; store: ObjectStore }, actor: Actor, attachmentId: string): Promise<Buffer> {
  const row = await attachmentWithProject(deps.db, attachmentId);
  if (!row || !(await mayReadRequest(deps.db, actor, row))) throw new HttpError(404, 'attachment_not_found', 'No attachment you can see has that id.');
  if (!previewableTypes.has(row.attachment.contentType)) throw new HttpError(404, 'no_preview', 'There is no preview of this kind of file; open it instead.');
  const previewKey = `${row.attachment.objectKey}.preview.jpg`;
  try {
    try {
      return await readAll((await deps.store.get(previewKey)).body);
    } catch {
      const original = await readAll((await deps.store.get(row.attachment.objectKey)).body);
      const preview = await sharp(original).rotate().resize({ width: 640, height: 640, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 75 }).toBuffer();
      await deps.store.put(previewKey, preview, 'image/jpeg', {});
      return preview;
    }
  } catch (err) {
    if (err instanceof HttpError) throw err;
    throw new HttpError(503, 'storage_unavailable', 'File storage is not reachable right now. Try again shortly.');
  }
}

async function readAll(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}
