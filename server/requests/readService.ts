// Reading requests: the register (filtered, cursor-paged, longest waiting first), one request in
// full with the moves this reader may make now, and the trail's chain verification.
import { z } from 'zod';
import type { Database } from '../../db/client';
import { revisionChanges } from '../../shared/requests/revisionDiff';
import type { RequestDraft } from '../../shared/requests/requestBody';
import { isRequestState, requestStateInfo, requestStates, statesAtDesk } from '../../shared/requests/states';
import type { Actor, RequestDetail, RequestPage } from '../../shared/requests/types';
import { availableEvents } from '../../shared/workflow/evaluate';
import type { WorkflowFacts } from '../../shared/workflow/rules';
import { HttpError } from '../http/errors';
import { verifyTrail } from '../trail/trailChain';
import { mayReadRequest, seesDrafts } from './access';
import {
  attachmentsOf,
  conditionsOf,
  countRequests,
  listRequests,
  membersWithRole,
  openConditionCount,
  requestForReader,
  requestRow,
  requestSummary,
  revisionsOf,
  toAttachmentSummary,
  trailOf,
  type RequestFilter,
} from './requestRepository';
import type { RequestCounts, RequestFilterQuery, RequestListQuery } from '../../shared/requests/listQuery';

export function encodeCursor(key: string, id: string): string {
  return Buffer.from(JSON.stringify([key, id])).toString('base64url');
}

function decodeCursor(cursor: string): { key: string; id: string } {
  try {
    const [key, id] = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')) as [unknown, unknown];
    // Every sort key is a time (or 'infinity' for no due date).
    if (typeof key !== 'string' || (key !== 'infinity' && !isDatabaseTime(key)) || typeof id !== 'string' || !uuid.safeParse(id).success) {
      throw new Error('bad cursor');
    }
    return { key, id };
  } catch {
    throw new HttpError(400, 'bad_cursor', 'That page cursor is not one this server gave out; start the list again.');
  }
}

const uuid = z.uuid();

// A time as PostgreSQL writes timestamptz as text ("2026-12-02 12:05:59.123456+00"), with a day that
// exists: JavaScript reads far more ("1", "2027") than PostgreSQL will, so the shape is checked here.
const databaseTime = /^(\d{4})-(\d{2})-(\d{2}) ([01]\d|2[0-3]):[0-5]\d:[0-5]\d(\.\d{1,6})?[+-]\d{2}(:\d{2}){0,2}$/;
function isDatabaseTime(key: string): boolean {
  const m = databaseTime.exec(key);
  if (!m) return false;
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const date = new Date(0);
  date.setUTCFullYear(year, month - 1, day);
  return year >= 1 && date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

// The filters as the repository takes them, narrowed to what this reader may see.
function filterFor(actor: Actor, q: RequestFilterQuery): RequestFilter {
  let states: string[] | undefined = q.state ? [q.state] : undefined;
  const narrow = (allowed: readonly string[]) => {
    states = states ? states.filter((s) => allowed.includes(s)) : [...allowed];
  };
  if (q.desk === 'mine') narrow(statesAtDesk(actor.role));
  if (q.atDesk) narrow(q.atDesk === 'settled' ? requestStates.filter((s) => requestStateInfo[s].settled) : statesAtDesk(q.atDesk));
  if (!seesDrafts(actor)) narrow(requestStates.filter((s) => s !== 'drafting'));
  return {
    // Auditors read every project; everyone else their own, looked up inside the list query.
    memberId: actor.role === 'auditor' ? undefined : actor.id,
    states,
    assignedEorId: q.desk === 'mine' && actor.role === 'engineer_of_record' ? actor.id : undefined,
    type: q.type,
    projectId: q.projectId,
    text: q.q,
  };
}

export async function listFor(db: Database, actor: Actor, q: RequestListQuery): Promise<RequestPage> {
  const rows = await listRequests(db, filterFor(actor, q), { sort: q.sort, after: q.cursor ? decodeCursor(q.cursor) : undefined }, q.limit + 1);
  const page = rows.slice(0, q.limit);
  const last = page[page.length - 1];
  return { items: page.map((r) => r.summary), nextCursor: rows.length > q.limit && last ? encodeCursor(last.sortKey, last.summary.id) : null };
}

export async function countsFor(db: Database, actor: Actor, q: RequestFilterQuery): Promise<RequestCounts> {
  const rows = await countRequests(db, filterFor(actor, q));
  const counts: RequestCounts = { total: 0, overdue: 0, byState: {} };
  for (const row of rows) {
    if (!isRequestState(row.state)) continue;
    counts.byState[row.state] = row.n;
    counts.total += row.n;
    counts.overdue += row.overdue;
  }
  return counts;
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
  const found = await requestForReader(db, requestId, actor.id);
  // Same answer for "missing" and "not yours", so ids of other projects cannot be probed.
  if (!found || !(actor.role === 'auditor' || found.member) || (found.summary.state === 'drafting' && !seesDrafts(actor))) {
    throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  }
  const record = await recordOf(db, found);
  const state = isRequestState(record.state) ? record.state : requestStates[0];
  return { ...record, availableActions: availableEvents(state, record.facts, { id: actor.id, role: actor.role, member: found.member }) };
}

// The request in full, as the record shows it to anyone allowed to read it (no viewer's moves).
export async function requestRecord(db: Database, requestId: string): Promise<RequestDetail | null> {
  const found = await requestForReader(db, requestId, null);
  return found ? recordOf(db, found) : null;
}

// The rest of the record in four queries run side by side, whatever the length of the trail.
async function recordOf(db: Database, found: NonNullable<Awaited<ReturnType<typeof requestForReader>>>): Promise<RequestDetail> {
  const { summary } = found;
  const requestId = summary.id;
  const [revisions, files, conditions, trail] = await Promise.all([
    revisionsOf(db, requestId),
    attachmentsOf(db, requestId),
    conditionsOf(db, requestId),
    trailOf(db, requestId),
  ]);
  const facts: WorkflowFacts = {
    assignedEorId: found.assignedEorId,
    federalAid: found.federalAid,
    majorChange: found.majorChange,
    federalConcurrence: found.federalConcurrence,
    openConditions: conditions.filter(({ condition }) => condition.satisfiedAt === null).length,
  };
  return {
    ...summary,
    decision: found.decision,
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
  if (!summary || !(await mayReadRequest(db, actor, { projectId: summary.project.id, state: summary.state }))) {
    throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  }
  const result = await verifyTrail(db, requestId);
  return result.ok ? { ok: true as const, events: result.events } : result;
}

// The engineers of record on the request's project, for central office to route or reassign to.
export async function engineersOfRecordFor(db: Database, actor: Actor, requestId: string) {
  const row = await requestRow(db, requestId);
  if (!row || !(await mayReadRequest(db, actor, row.request))) throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  return membersWithRole(db, row.request.projectId, 'engineer_of_record');
}
