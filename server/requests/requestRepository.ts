// Database access for requests; services call these inside or outside a transaction.
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { attachments, changeRequests, projectMembers, projects, trailEvents, users } from '../../db/schema';
import type { AttachmentSummary, RequestDetail, RequestSummary, TrailEntry } from '../../shared/requests/types';
import type { Role } from '../../shared/roles';

type Executor = Database | Transaction;

const summaryColumns = {
  id: changeRequests.id,
  number: changeRequests.number,
  title: changeRequests.title,
  state: changeRequests.state,
  version: changeRequests.version,
  createdAt: changeRequests.createdAt,
  updatedAt: changeRequests.updatedAt,
  projectId: projects.id,
  projectCode: projects.code,
  projectName: projects.name,
  structureNumber: projects.structureNumber,
  filedByName: users.name,
  filedByOrganization: users.organization,
};

type SummaryRow = Awaited<ReturnType<ReturnType<typeof summaryQuery>['execute']>>[number];

function toSummary(row: SummaryRow): RequestSummary {
  return {
    id: row.id,
    number: row.number,
    title: row.title,
    state: row.state,
    version: row.version,
    project: { id: row.projectId, code: row.projectCode, name: row.projectName, structureNumber: row.structureNumber },
    filedBy: { name: row.filedByName, organization: row.filedByOrganization },
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

function summaryQuery(db: Executor) {
  return db
    .select(summaryColumns)
    .from(changeRequests)
    .innerJoin(projects, eq(projects.id, changeRequests.projectId))
    .innerJoin(users, eq(users.id, changeRequests.filedById));
}

// Requests of every project the user belongs to; `states` narrows to those at a given desk.
export async function requestsVisibleTo(db: Database, userId: string, states?: readonly string[]): Promise<RequestSummary[]> {
  const memberOf = db.select({ id: projectMembers.projectId }).from(projectMembers).where(eq(projectMembers.userId, userId));
  const where = states
    ? and(inArray(changeRequests.projectId, memberOf), inArray(changeRequests.state, [...states]))
    : inArray(changeRequests.projectId, memberOf);
  const rows = await summaryQuery(db).where(where).orderBy(desc(changeRequests.updatedAt)).limit(200);
  return rows.map(toSummary);
}

export async function requestDetail(db: Database, id: string): Promise<RequestDetail | null> {
  const [row] = await db
    .select({ ...summaryColumns, reason: changeRequests.reason })
    .from(changeRequests)
    .innerJoin(projects, eq(projects.id, changeRequests.projectId))
    .innerJoin(users, eq(users.id, changeRequests.filedById))
    .where(eq(changeRequests.id, id))
    .limit(1);
  if (!row) return null;
  const files = await db
    .select()
    .from(attachments)
    .where(eq(attachments.requestId, id))
    .orderBy(asc(attachments.uploadedAt));
  const trail = await db
    .select({ event: trailEvents, actorName: users.name })
    .from(trailEvents)
    .innerJoin(users, eq(users.id, trailEvents.actorId))
    .where(eq(trailEvents.requestId, id))
    .orderBy(asc(trailEvents.seq));
  return {
    ...toSummary(row),
    reason: row.reason,
    attachments: files.map(
      (f): AttachmentSummary => ({
        id: f.id,
        fileName: f.fileName,
        contentType: f.contentType,
        sizeBytes: f.sizeBytes,
        sha256: f.sha256,
        uploadedAt: f.uploadedAt.toISOString(),
      }),
    ),
    trail: trail.map(
      ({ event, actorName }): TrailEntry => ({
        seq: event.seq,
        eventType: event.eventType,
        stateBefore: event.stateBefore,
        stateAfter: event.stateAfter,
        actorName,
        actorRole: event.actorRole,
        comment: event.comment,
        at: event.createdAt.toISOString(),
      }),
    ),
  };
}

export async function projectIdOfRequest(db: Database, requestId: string): Promise<string | null> {
  const [row] = await db.select({ projectId: changeRequests.projectId }).from(changeRequests).where(eq(changeRequests.id, requestId));
  return row?.projectId ?? null;
}

export async function attachmentWithProject(db: Database, attachmentId: string) {
  const [row] = await db
    .select({ attachment: attachments, projectId: changeRequests.projectId })
    .from(attachments)
    .innerJoin(changeRequests, eq(changeRequests.id, attachments.requestId))
    .where(eq(attachments.id, attachmentId));
  return row ?? null;
}

// Takes the next number of the project under its row lock, so two filings never share one.
export async function takeRequestNumber(tx: Transaction, projectId: string): Promise<string> {
  const [row] = await tx
    .update(projects)
    .set({ nextRequestSeq: sql`${projects.nextRequestSeq} + 1` })
    .where(eq(projects.id, projectId))
    .returning({ code: projects.code, seq: sql<number>`${projects.nextRequestSeq} - 1` });
  if (!row) throw new Error(`project ${projectId} vanished during filing`);
  return `${row.code}-${String(row.seq).padStart(3, '0')}`;
}

export async function membersWithRole(tx: Executor, projectId: string, role: Role) {
  return tx
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .innerJoin(projectMembers, eq(projectMembers.userId, users.id))
    .where(and(eq(projectMembers.projectId, projectId), eq(users.role, role)));
}

export async function projectById(db: Executor, projectId: string) {
  const [row] = await db.select().from(projects).where(eq(projects.id, projectId));
  return row ?? null;
}
