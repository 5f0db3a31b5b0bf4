// What the auditor takes away: trails found across every request the reader may see, one trail as
// CSV that anyone can re-verify without us, and the decision record rendered on demand.
import type { Database } from '../../db/client';
import { canonicalJson } from '../../shared/trail/canonicalJson';
import { boundsOf, type TrailSearchPage, type TrailSearchQuery } from '../../shared/trail/trailSearch';
import type { Actor, RequestSummary } from '../../shared/requests/types';
import { renderDecisionRecord } from '../documents/decisionRecord';
import { HttpError } from '../http/errors';
import { mayReadRequest, readableProjectIds, seesDrafts } from '../requests/access';
import { requestRecord } from '../requests/readService';
import { requestSummary, trailOf } from '../requests/requestRepository';
import { hashedEventOf, verifyTrail } from '../trail/trailChain';
import { searchTrails } from './auditRepository';
import { csvDocument } from './csv';

function encodeCursor(lastEventAt: string, id: string): string {
  return Buffer.from(JSON.stringify([lastEventAt, id])).toString('base64url');
}

function decodeCursor(cursor: string): { lastEventAt: Date; id: string } {
  try {
    const [at, id] = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')) as [unknown, unknown];
    const lastEventAt = new Date(String(at));
    // Years PostgreSQL's timestamptz cannot hold are as foreign as any other made-up cursor.
    const year = lastEventAt.getUTCFullYear();
    if (typeof at !== 'string' || Number.isNaN(lastEventAt.getTime()) || year < 1 || year > 9999 || typeof id !== 'string' || !/^[0-9a-f-]{36}$/i.test(id)) throw new Error('bad cursor');
    return { lastEventAt, id };
  } catch {
    throw new HttpError(400, 'bad_cursor', 'That page cursor is not one this server gave out; search again.');
  }
}

export async function searchFor(db: Database, actor: Actor, q: TrailSearchQuery): Promise<TrailSearchPage> {
  const hits = await searchTrails(db, {
    projectIds: await readableProjectIds(db, actor),
    withDrafts: seesDrafts(actor),
    number: q.number,
    structure: q.structure,
    person: q.person,
    from: q.from ? boundsOf(q.from).start : undefined,
    before: q.to ? boundsOf(q.to).end : undefined,
    decision: q.decision,
    after: q.cursor ? decodeCursor(q.cursor) : undefined,
    limit: q.limit + 1,
  });
  const page = hits.slice(0, q.limit);
  const last = page.at(-1);
  return { items: page, nextCursor: hits.length > q.limit && last ? encodeCursor(last.lastEventAt, last.id) : null };
}

// Same answer for "missing" and "not yours", so ids of other projects cannot be probed.
async function readable(db: Database, actor: Actor, requestId: string): Promise<RequestSummary> {
  const summary = await requestSummary(db, requestId);
  if (!summary || !(await mayReadRequest(db, actor, { projectId: summary.project.id, state: summary.state }))) throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
  return summary;
}

// A name safe in a content-disposition header whatever a project code holds.
export const fileNameOf = (number: string, suffix: string) => `${number.replace(/[^A-Za-z0-9._-]/g, '_')}${suffix}`;

export const trailCsvHeader = [
  'seq',
  'at',
  'actor_name',
  'actor_organization',
  'actor_role',
  'event',
  'state_before',
  'state_after',
  'comment',
  'prev_hash',
  'hash',
  // Exactly the text that was hashed: hash = SHA-256(prev_hash ‖ hashed_event).
  'hashed_event',
];

export async function trailCsvFor(db: Database, actor: Actor, requestId: string): Promise<{ fileName: string; csv: string }> {
  const summary = await readable(db, actor, requestId);
  const rows = (await trailOf(db, requestId)).map(({ event: e, actorName, actorOrganization }) => {
    const hashed = hashedEventOf(e);
    return [e.seq, hashed.createdAt, actorName, actorOrganization, e.actorRole, e.eventType, e.stateBefore, e.stateAfter, e.comment, e.prevHash, e.hash, canonicalJson(hashed)];
  });
  return { fileName: fileNameOf(summary.number, '-trail.csv'), csv: csvDocument(trailCsvHeader, rows) };
}

// The renderer says "Decision: none yet" for a request still in progress, so this works at any state.
export async function decisionRecordFor(db: Database, actor: Actor, requestId: string): Promise<{ fileName: string; pdf: Buffer }> {
  const summary = await readable(db, actor, requestId);
  const request = (await requestRecord(db, requestId))!;
  const chain = await verifyTrail(db, requestId);
  const pdf = await renderDecisionRecord({
    request,
    chain: chain.ok ? chain : { ok: false, events: request.trail.length, lastHash: request.trail.at(-1)?.hash ?? '' },
    generatedAt: new Date(),
  });
  return { fileName: fileNameOf(summary.number, '-decision-record.pdf'), pdf };
}
