// The tamper-evident trail: hash = SHA-256(previous hash ‖ canonical JSON of this event), one chain
// per request, time taken from the database. Appends run under the request's row lock.
import { createHash } from 'node:crypto';
import { asc, desc, eq, sql } from 'drizzle-orm';
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

export async function appendTrailEvent(tx: Transaction, input: TrailAppend) {
  const [last] = await tx
    .select({ seq: trailEvents.seq, hash: trailEvents.hash })
    .from(trailEvents)
    .where(eq(trailEvents.requestId, input.requestId))
    .orderBy(desc(trailEvents.seq))
    .limit(1);
  // Milliseconds, so the time a JavaScript Date carries is exactly the time stored and hashed.
  const createdAt = input.at ? new Date(Math.floor(input.at.getTime())) : await databaseClock(tx);
  // jsonb keeps numbers and strings as JSON has them; a round trip here makes the hashed payload
  // exactly what will be read back.
  const payload = JSON.parse(JSON.stringify(input.payload ?? {})) as Record<string, unknown>;
  const event: HashedTrailEvent = {
    requestId: input.requestId,
    seq: (last?.seq ?? 0) + 1,
    eventType: input.eventType,
    stateBefore: input.stateBefore,
    stateAfter: input.stateAfter,
    actorId: input.actor.id,
    actorRole: input.actor.role,
    comment: input.comment ?? null,
    payload,
    createdAt: createdAt.toISOString(),
  };
  const prevHash = last?.hash ?? genesisHash;
  const hash = trailHash(prevHash, event);
  const [row] = await tx
    .insert(trailEvents)
    .values({ ...event, actorRole: input.actor.role, createdAt, prevHash, hash })
    .returning();
  return row!;
}

async function databaseClock(tx: Transaction): Promise<Date> {
  const [{ at } = { at: new Date() }] = await tx.execute<{ at: Date }>(sql`select date_trunc('milliseconds', clock_timestamp()) as at`).then((r) => r.rows);
  return new Date(at);
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
