// Finding requests by their trail: who acted in it, when, and how it was decided. Most recent
// activity first; the cursor is the last hit's (last event time, id). Trail times are stored to the
// millisecond, so a JavaScript Date carries a cursor time exactly.
import { and, count, desc, eq, exists, gte, ilike, inArray, isNull, lt, max, ne, or, sql, type SQL } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { changeRequests, projects, trailEvents, users } from '../../db/schema';
import type { TrailDecision, TrailSearchHit } from '../../shared/trail/trailSearch';

export type TrailSearchFilter = {
  // Projects the reader may see; undefined means every project (auditors).
  projectIds?: string[];
  // Requests still being drafted are the contractor's own (server/requests/access.ts).
  withDrafts: boolean;
  number?: string;
  structure?: string;
  person?: string;
  // Some trail event at or after `from` and before `before`.
  from?: Date;
  before?: Date;
  decision?: TrailDecision;
  after?: { lastEventAt: Date; id: string };
  limit: number;
};

const contains = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

function eventOfRequest(db: Database, ...conditions: (SQL | undefined)[]) {
  return exists(
    db
      .select({ one: sql`1` })
      .from(trailEvents)
      .innerJoin(users, eq(users.id, trailEvents.actorId))
      .where(and(eq(trailEvents.requestId, changeRequests.id), ...conditions)),
  );
}

export async function searchTrails(db: Database, f: TrailSearchFilter): Promise<TrailSearchHit[]> {
  const activity = db
    .select({ requestId: trailEvents.requestId, lastEventAt: max(trailEvents.createdAt).as('last_event_at'), events: count().as('events') })
    .from(trailEvents)
    .groupBy(trailEvents.requestId)
    .as('activity');

  const where: (SQL | undefined)[] = [];
  if (f.projectIds) where.push(f.projectIds.length ? inArray(changeRequests.projectId, f.projectIds) : sql`false`);
  if (!f.withDrafts) where.push(ne(changeRequests.state, 'drafting'));
  if (f.number) where.push(ilike(changeRequests.number, contains(f.number)));
  if (f.structure) where.push(ilike(projects.structureNumber, contains(f.structure)));
  if (f.person) where.push(eventOfRequest(db, or(ilike(users.name, contains(f.person)), ilike(users.email, contains(f.person)))));
  if (f.from || f.before) {
    where.push(eventOfRequest(db, f.from ? gte(trailEvents.createdAt, f.from) : undefined, f.before ? lt(trailEvents.createdAt, f.before) : undefined));
  }
  if (f.decision) where.push(f.decision === 'undecided' ? isNull(changeRequests.decision) : eq(changeRequests.decision, f.decision));
  if (f.after) {
    const at = sql`${f.after.lastEventAt.toISOString()}::timestamptz`;
    where.push(sql`(${activity.lastEventAt} < ${at} or (${activity.lastEventAt} = ${at} and ${changeRequests.id} < ${f.after.id}::uuid))`);
  }

  const rows = await db
    .select({
      id: changeRequests.id,
      number: changeRequests.number,
      title: changeRequests.title,
      state: changeRequests.state,
      decision: changeRequests.decision,
      projectId: projects.id,
      projectCode: projects.code,
      projectName: projects.name,
      structureNumber: projects.structureNumber,
      lastEventAt: activity.lastEventAt,
      events: activity.events,
    })
    .from(changeRequests)
    .innerJoin(projects, eq(projects.id, changeRequests.projectId))
    .innerJoin(activity, eq(activity.requestId, changeRequests.id))
    .where(and(...where))
    .orderBy(desc(activity.lastEventAt), desc(changeRequests.id))
    .limit(f.limit);

  return rows.map((r) => ({
    id: r.id,
    number: r.number,
    title: r.title,
    state: r.state,
    decision: r.decision,
    project: { id: r.projectId, code: r.projectCode, name: r.projectName, structureNumber: r.structureNumber },
    lastEventAt: new Date(r.lastEventAt as Date | string).toISOString(),
    events: Number(r.events),
  }));
}
