// Reading requests: the register (filtered, cursor-paged, longest waiting first), one request in
// full with the moves this reader may make now, and the trail's chain verification.
import type { Database } from '../../db/client';
import { revisionChanges } from '../../shared/requests/revisionDiff';
import type { RequestDraft } from '../../shared/requests/requestBody';
import { isRequestState, requestStates, statesAtDesk } from '../../shared/requests/states';
import type { Actor, RequestDetail, RequestPage } from '../../shared/requests/types';
import { availableEvents } from '../../shared/workflow/evaluate';
import type { WorkflowFacts } from '../../shared/workflow/rules';
import { HttpError } from '../http/errors';
import { isProjectMember } from '../projects/projectRepository';
import { verifyTrail } from '../trail/trailChain';
import { mayRead, readableProjectIds } from './access';
import {
  attachmentsOf,
  conditionsOf,
  listRequests,
  membersWithRole,
  openConditionCount,
  requestRow,
  requestSummary,
  revisionsOf,
  toAttachmentSummary,
  trailOf,
} from './requestRepository';
import type { RequestListQuery } from '../../shared/requests/listQuery';

export function encodeCursor(deskSince: string, id: string): string {
  return Buffer.from(JSON.stringify([deskSince, id])).toString('base64url');
}

function decodeCursor(cursor: string): { deskSince: Date; id: string } {
  try {
    const [deskSince, id] = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')) as [string, string];
    const at = new Date(deskSince);
    if (Number.isNaN(at.getTime()) || typeof id !== 'string') throw new Error('bad cursor');
    return { deskSince: at, id };
  } catch {
    throw new HttpError(400, 'bad_cursor', 'That page cursor is not one this server gave out; start the list again.');
  }
}

export async function listFor(db: Database, actor: Actor, q: RequestListQuery): Promise<RequestPage> {
  let states = q.state ? [q.state] : undefined;
  if (q.desk === 'mine') {
    const mine = statesAtDesk(actor.role);
    states = states ? states.filter((s) => mine.includes(s as never)) : mine;
  }
  const items = await listRequests(db, {
    projectIds: await readableProjectIds(db, actor),
    states,
    assignedEorId: q.desk === 'mine' && actor.role === 'engineer_of_record' ? actor.id : undefined,
    type: q.type,
    projectId: q.projectId,
    text: q.q,
    after: q.cursor ? decodeCursor(q.cursor) : undefined,
    limit: q.limit + 1,
  });
  const page = items.slice(0, q.limit);
  const last = page[page.length - 1];
  return { items: page, nextCursor: items.length > q.limit && last ? encodeCursor(last.deskSince, last.id) : null };
}

export async function workflowFactsOf(db: Database, requestId: string): Promise<WorkflowFacts | null> {
  const row = await requestRow(db, requestId);
  if (!row) return null;
  return {
    assignedEorId: row.request.assignedEorId,
    federalAid: row.federalAid,
    majorChange: row.request.majorChange,
    federalConcurrence: row.request.federalConcurrenceAttachmentId !== null,
    openConditions: await openConditionCount(db, requestId),
  };
}

export async function detailFor(db: Database, actor: Actor, requestId: string): Promise<RequestDetail> {
  const summary = await requestSummary(db, requestId);
  // Same answer for "missing" and "not yours", so ids of other projects cannot be probed.
  if (!summary || !(await mayRead(db, actor, summary.project.id))) {
    throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  }
  const record = (await requestRecord(db, requestId))!;
  const member = await isProjectMember(db, summary.project.id, actor.id);
  const state = isRequestState(record.state) ? record.state : requestStates[0];
  return { ...record, availableActions: availableEvents(state, record.facts, { id: actor.id, role: actor.role, member }) };
}

// The request in full, as the record shows it to anyone allowed to read it (no viewer's moves).
export async function requestRecord(db: Database, requestId: string): Promise<RequestDetail | null> {
  const summary = await requestSummary(db, requestId);
  if (!summary) return null;
  const row = await requestRow(db, requestId);
  const facts = (await workflowFactsOf(db, requestId))!;
  const [revisions, files, conditions, trail] = await Promise.all([
    revisionsOf(db, requestId),
    attachmentsOf(db, requestId),
    conditionsOf(db, requestId),
    trailOf(db, requestId),
  ]);
  return {
    ...summary,
    decision: row?.request.decision ?? null,
    facts,
    revisions: revisions.map((r, i) => ({
      revision: r.revision,
      body: r.body as RequestDraft,
      engineering: r.engineering,
      createdAt: r.createdAt.toISOString(),
      submittedAt: r.submittedAt?.toISOString() ?? null,
      changes: i === 0 ? [] : revisionChanges(revisions[i - 1]!.body, r.body),
    })),
    attachments: files.map(({ attachment, uploaderName }) => toAttachmentSummary(attachment, uploaderName)),
    conditions: conditions.map(({ condition: c, satisfierName, satisfierOrganization }) => ({
      id: c.id,
      seq: c.seq,
      text: c.text,
      dueBefore: c.dueBefore,
      satisfied: c.satisfiedAt !== null,
      satisfiedBy: c.satisfiedById ? { id: c.satisfiedById, name: satisfierName ?? '', organization: satisfierOrganization } : null,
      satisfiedAt: c.satisfiedAt?.toISOString() ?? null,
      note: c.note,
      evidenceAttachmentId: c.evidenceAttachmentId,
    })),
    trail: trail.map(({ event: e, actorName, actorOrganization }) => ({
      seq: e.seq,
      eventType: e.eventType,
      stateBefore: e.stateBefore,
      stateAfter: e.stateAfter,
      actor: { id: e.actorId, name: actorName, organization: actorOrganization },
      actorRole: e.actorRole,
      comment: e.comment,
      payload: e.payload as Record<string, unknown>,
      at: e.createdAt.toISOString(),
      hash: e.hash,
    })),
    availableActions: [],
  };
}

export async function verifyFor(db: Database, actor: Actor, requestId: string) {
  const summary = await requestSummary(db, requestId);
  if (!summary || !(await mayRead(db, actor, summary.project.id))) {
    throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  }
  const result = await verifyTrail(db, requestId);
  return result.ok ? { ok: true as const, events: result.events } : result;
}

// The engineers of record on the request's project, for central office to route or reassign to.
export async function engineersOfRecordFor(db: Database, actor: Actor, requestId: string) {
  const row = await requestRow(db, requestId);
  if (!row || !(await mayRead(db, actor, row.request.projectId))) throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  return membersWithRole(db, row.request.projectId, 'engineer_of_record');
}
