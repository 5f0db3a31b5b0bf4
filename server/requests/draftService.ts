// Drafts: a contractor starts a request and edits it until it is submitted (and again, as a new
// revision, after a return). Nothing here moves the workflow; that is the workflow service's.
import { randomUUID } from 'node:crypto';
import { and, eq, sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { changeRequests, requestRevisions } from '../../db/schema';
import type { RequestDraft } from '../../shared/requests/requestBody';
import type { Actor } from '../../shared/requests/types';
import { HttpError } from '../http/errors';
import { isProjectMember } from '../projects/projectRepository';
import { appendTrailEvent, type RecordedAt } from '../trail/trailChain';
import { mayReadRequest } from './access';
import { lockRequest, projectById, takeRequestNumber } from './requestRepository';

const editableStates = ['drafting', 'revising'];
const untitled = 'Untitled request';

export async function createDraft(db: Database, actor: Actor, draft: RequestDraft, when: RecordedAt = {}): Promise<string> {
  if (actor.role !== 'contractor') throw new HttpError(403, 'not_contractor', 'Only a contractor starts a request.');
  const project = await projectById(db, draft.projectId);
  if (!project || !(await isProjectMember(db, project.id, actor.id))) {
    throw new HttpError(404, 'project_not_found', 'No project of yours has that id.', { projectId: 'Choose one of your projects.' });
  }
  const id = randomUUID();
  await db.transaction(async (tx) => {
    const number = await takeRequestNumber(tx, project.id);
    await tx
      .insert(changeRequests)
      .values({ id, number, projectId: project.id, type: draft.type, title: draft.title ?? untitled, state: 'drafting', filedById: actor.id, ...(when.at ? { createdAt: when.at, updatedAt: when.at } : {}) });
    await tx.insert(requestRevisions).values({ requestId: id, revision: 1, body: draft, ...(when.at ? { createdAt: when.at } : {}) });
    const event = await appendTrailEvent(tx, {
      requestId: id,
      eventType: 'created',
      stateBefore: null,
      stateAfter: 'drafting',
      actor,
      payload: { number, type: draft.type, revision: 1 },
      at: when.at,
    });
    await tx.update(changeRequests).set({ deskSince: event.createdAt }).where(eq(changeRequests.id, id));
  });
  return id;
}

export async function updateDraft(db: Database, actor: Actor, requestId: string, version: number, draft: RequestDraft, when: RecordedAt = {}): Promise<void> {
  await db.transaction(async (tx) => {
    const locked = await lockRequest(tx, requestId);
    // An auditor sees every request, so for them it exists: refused (403), not hidden (404).
    if (!locked || !(await mayReadRequest(tx, actor, locked.request))) {
      throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
    }
    const r = locked.request;
    if (actor.role !== 'contractor' || !(await isProjectMember(tx, r.projectId, actor.id))) {
      throw new HttpError(403, 'not_contractor', 'Only the contractor edits the request.');
    }
    if (!editableStates.includes(r.state)) {
      throw new HttpError(409, 'not_editable', 'The request is with a reviewer; it can be edited again only if it is returned for revision.');
    }
    if (r.version !== version) throw staleVersion(r.version);
    if (draft.type !== r.type || draft.projectId !== r.projectId) {
      throw new HttpError(400, 'invalid_input', 'The type and project of a request cannot change; start a new request instead.', {
        type: 'Cannot change.',
      });
    }
    await tx
      .update(requestRevisions)
      .set({ body: draft })
      .where(and(eq(requestRevisions.requestId, requestId), eq(requestRevisions.revision, r.currentRevision)));
    await tx
      .update(changeRequests)
      .set({ title: draft.title ?? untitled, version: sql`${changeRequests.version} + 1`, updatedAt: when.at ?? sql`now()` })
      .where(eq(changeRequests.id, requestId));
  });
}

export function staleVersion(current: number): HttpError {
  return new HttpError(
    409,
    'stale_version',
    `Someone changed this request since you opened it (it is now at version ${current}). Reload it, check what changed, and try again; nothing was saved.`,
  );
}
