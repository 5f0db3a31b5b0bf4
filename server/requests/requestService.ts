// Filing and reading requests. Files go to the object store first; the rows (request, attachments,
// first trail event, queued mail) are then written in one transaction. If that transaction fails
// the stored objects are removed again, so nothing is left half-written either way.
import { createHash, randomUUID } from 'node:crypto';
import type { Database } from '../../db/client';
import { attachments, changeRequests, trailEvents } from '../../db/schema';
import type { RequestFilingFields } from '../../shared/requests/filing';
import { requestStateInfo, stateLabel, type RequestState } from '../../shared/requests/states';
import type { Actor, RequestDetail, RequestSummary } from '../../shared/requests/types';
import { HttpError } from '../http/errors';
import { enqueueMail } from '../mail/outbox';
import type { ObjectStore } from '../storage/objectStore';
import { isProjectMember } from '../projects/projectRepository';
import {
  attachmentWithProject,
  membersWithRole,
  projectById,
  requestDetail,
  requestsVisibleTo,
  takeRequestNumber,
} from './requestRepository';

export type IncomingFile = { originalname: string; mimetype: string; size: number; buffer: Buffer };

export type RequestServiceDeps = { db: Database; store: ObjectStore; publicUrl: string; onMailQueued: () => void };

const firstState: RequestState = 'section_review';

function objectKeyFor(projectId: string, requestId: string, revision: number): string {
  return `projects/${projectId}/requests/${requestId}/rev-${revision}/${randomUUID()}`;
}

export function createRequestService(deps: RequestServiceDeps) {
  const { db, store } = deps;

  async function fileRequest(actor: Actor, fields: RequestFilingFields, files: IncomingFile[]): Promise<RequestDetail> {
    if (actor.role !== 'contractor') throw new HttpError(403, 'not_contractor', 'Only a contractor can file a request.');
    const project = await projectById(db, fields.projectId);
    if (!project || !(await isProjectMember(db, project.id, actor.id))) {
      throw new HttpError(404, 'project_not_found', 'No project of yours has that id.');
    }
    for (const file of files) {
      if (file.size === 0) throw new HttpError(400, 'empty_file', `"${file.originalname}" is empty.`);
    }

    const requestId = randomUUID();
    const stored: { key: string; file: IncomingFile; sha256: string }[] = [];
    try {
      for (const file of files) {
        const key = objectKeyFor(project.id, requestId, 1);
        const sha256 = createHash('sha256').update(file.buffer).digest('hex');
        await store.put(key, file.buffer, file.mimetype, { 'original-name': file.originalname, sha256 });
        stored.push({ key, file, sha256 });
      }
    } catch (err) {
      await removeQuietly(stored.map((s) => s.key));
      console.error('[spanrelay] object store refused an upload', err);
      throw new HttpError(503, 'storage_unavailable', 'File storage is not reachable right now; nothing was filed. Try again shortly.');
    }

    try {
      await db.transaction(async (tx) => {
        const number = await takeRequestNumber(tx, project.id);
        await tx.insert(changeRequests).values({
          id: requestId,
          number,
          projectId: project.id,
          title: fields.title,
          reason: fields.reason,
          state: firstState,
          filedById: actor.id,
        });
        if (stored.length) {
          await tx.insert(attachments).values(
            stored.map((s) => ({
              id: randomUUID(),
              requestId,
              objectKey: s.key,
              fileName: s.file.originalname,
              contentType: s.file.mimetype,
              sizeBytes: s.file.size,
              sha256: s.sha256,
              uploadedById: actor.id,
            })),
          );
        }
        await tx.insert(trailEvents).values({
          requestId,
          seq: 1,
          eventType: 'filed',
          stateBefore: null,
          stateAfter: firstState,
          actorId: actor.id,
          actorRole: actor.role,
          payload: { title: fields.title, attachments: stored.map((s) => ({ fileName: s.file.originalname, sha256: s.sha256 })) },
        });
        const reviewers = await membersWithRole(tx, project.id, requestStateInfo[firstState].desk ?? 'section_engineer');
        await enqueueMail(
          tx,
          requestId,
          reviewers.map((r) => ({
            to: r.email,
            subject: `${number} is waiting at your desk: ${fields.title}`,
            text: [
              `Hello ${r.name},`,
              '',
              `${actor.name}${actor.organization ? ` (${actor.organization})` : ''} filed request ${number} on ${project.name} (structure ${project.structureNumber}).`,
              `It is now ${stateLabel(firstState).toLowerCase()}.`,
              '',
              `Title: ${fields.title}`,
              `Attachments: ${stored.length}`,
              '',
              `Open it: ${deps.publicUrl}/requests/${requestId}`,
            ].join('\n'),
          })),
        );
      });
    } catch (err) {
      await removeQuietly(stored.map((s) => s.key));
      throw err;
    }
    deps.onMailQueued();
    const detail = await requestDetail(db, requestId);
    if (!detail) throw new Error('filed request not readable');
    return detail;
  }

  async function removeQuietly(keys: string[]) {
    await Promise.allSettled(keys.map((k) => store.remove(k)));
  }

  async function listFor(actor: Actor, deskOnly: boolean): Promise<RequestSummary[]> {
    const states = deskOnly
      ? (Object.entries(requestStateInfo) as [RequestState, { desk: string | null }][]).filter(([, i]) => i.desk === actor.role).map(([s]) => s)
      : undefined;
    return requestsVisibleTo(db, actor.id, states);
  }

  async function readFor(actor: Actor, requestId: string): Promise<RequestDetail> {
    const detail = await requestDetail(db, requestId);
    // Same answer for "missing" and "not yours", so ids of other projects cannot be probed.
    if (!detail || !(await isProjectMember(db, detail.project.id, actor.id))) {
      throw new HttpError(404, 'request_not_found', 'No request of yours has that id.');
    }
    return detail;
  }

  async function openAttachment(actor: Actor, attachmentId: string) {
    const row = await attachmentWithProject(db, attachmentId);
    if (!row || !(await isProjectMember(db, row.projectId, actor.id))) {
      throw new HttpError(404, 'attachment_not_found', 'No attachment of yours has that id.');
    }
    try {
      return { attachment: row.attachment, object: await store.get(row.attachment.objectKey) };
    } catch {
      throw new HttpError(503, 'storage_unavailable', 'File storage is not reachable right now. Try again shortly.');
    }
  }

  return { fileRequest, listFor, readFor, openAttachment };
}

export type RequestService = ReturnType<typeof createRequestService>;
