// The tamper-evident trail: hash = SHA-256(previous hash ‖ canonical JSON of this event), one chain
// per request, time taken from the database. Appends run under the request's row lock.
import { createHash } from 'node:crypto';
import { asc, eq, sql } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { trailEvents } from '../../db/schema';
import { canonicalJson, genesisHash, type HashedTrailEvent } from '../../shared/trail/canonicalJson';
import type { Role } from '../../shared/roles';

export function trailHash(prevHash: string, event: HashedTrailEvent): string {
  return createHash('sha256').update(prevHash).update(canonicalJson(event)).digest('hex');
}

// When a move is recorded as made: absent for every move made through the API (the database's
// clock); the demo seed alone passes the day of its invented history.
export type RecordedAt = { at?: Date };

export type TrailAppend = {
  requestId: string;
  eventType: string;
  stateBefore: string | null;
  stateAfter: string;
  actor: { id: string; role: Role };
  comment?: string | null;
  payload?: Record<string, unknown>;
} & RecordedAt;

// The chain's last link as read under the request's lock (seq and hash absent before a request's
// first event), with the database's clock at that moment.
export type TrailLink = { seq: number | null; hash: string | null; clock: Date };

// The next link of the chain: the event as hashed, its hash and the one before it. Shared by the
// append below and a move's single record statement (server/workflow/moveStatements.ts).
export function nextLink(last: TrailLink, input: TrailAppend) {
  // Milliseconds, so the time a JavaScript Date carries is exactly the time stored and hashed.
  const createdAt = input.at ? new Date(Math.floor(input.at.getTime())) : last.clock;
  // jsonb keeps numbers and strings as JSON has them; a round trip here makes the hashed payload
  // exactly what will be read back.
  const payload = JSON.parse(JSON.stringify(input.payload ?? {})) as Record<string, unknown>;
  const event: HashedTrailEvent = {
    requestId: input.requestId,
    seq: (last.seq ?? 0) + 1,
    eventType: input.eventType,
    stateBefore: input.stateBefore,
    stateAfter: input.stateAfter,
    actorId: input.actor.id,
    actorRole: input.actor.role,
    comment: input.comment ?? null,
    payload,
    createdAt: createdAt.toISOString(),
  };
  const prevHash = last.hash ?? genesisHash;
  return { event, payload, createdAt, prevHash, hash: trailHash(prevHash, event) };
}

export async function appendTrailEvent(tx: Transaction, input: TrailAppend, last?: TrailLink) {
  const link = nextLink(last ?? (await lastEventAndClock(tx, input.requestId)), input);
  const [row] = await tx
    .insert(trailEvents)
    .values({ ...link.event, actorRole: input.actor.role, createdAt: link.createdAt, prevHash: link.prevHash, hash: link.hash })
    .returning();
  return row!;
}

// The chain's last link and the database's clock in one statement (a move is a dozen statements
// under the request's lock; each one less shortens the queue behind it). The clock row is always
// there; the link is absent for a request's first event.
async function lastEventAndClock(tx: Transaction, requestId: string): Promise<TrailLink> {
  const { rows } = await tx.execute<{ seq: number | null; hash: string | null; at: Date | string }>(sql`
    select last.seq, last.hash, date_trunc('milliseconds', clock_timestamp()) as at
    from (select 1) as one
    left join lateral (
      select ${trailEvents.seq} as seq, ${trailEvents.hash} as hash from ${trailEvents}
      where ${trailEvents.requestId} = ${requestId} order by ${trailEvents.seq} desc limit 1
    ) as last on true`);
  const row = rows[0];
  if (!row) throw new Error('the database clock answered no row');
  return { seq: row.seq === null ? null : Number(row.seq), hash: row.hash, clock: new Date(row.at) };
}

// The stored row as it was hashed; exports print it so others can recompute the chain.
export function hashedEventOf(row: typeof trailEvents.$inferSelect): HashedTrailEvent {
  return {
    requestId: row.requestId,
    seq: row.seq,
    eventType: row.eventType,
    stateBefore: row.stateBefore,
    stateAfter: row.stateAfter,
    actorId: row.actorId,
    actorRole: row.actorRole,
    comment: row.comment,
    payload: row.payload,
    createdAt: row.createdAt.toISOString(),
  };
}

export type TrailVerification = { ok: true; events: number; lastHash: string } | { ok: false; brokenAt: number };

export async function verifyTrail(db: Database, requestId: string): Promise<TrailVerification> {
  const rows = await db.select().from(trailEvents).where(eq(trailEvents.requestId, requestId)).orderBy(asc(trailEvents.seq));
  let prevHash = genesisHash;
  let expectedSeq = 1;
  for (const row of rows) {
    // A missing sequence number means a row was removed: the break is where it was.
    if (row.seq !== expectedSeq) return { ok: false, brokenAt: expectedSeq };
    if (row.prevHash !== prevHash || trailHash(prevHash, hashedEventOf(row)) !== row.hash) return { ok: false, brokenAt: row.seq };
    prevHash = row.hash;
    expectedSeq += 1;
  }
  return { ok: true, events: rows.length, lastHash: prevHash };
}
