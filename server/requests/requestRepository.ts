// Database access for requests. Writes run inside the service's transaction, under the request's
// row lock taken by `lockRequest`.
import { createHash } from 'node:crypto';
import { aliasedTable, and, asc, count, desc, eq, gt, ilike, inArray, isNull, lt, or, sql, type SQL } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { runNamed } from '../../db/namedStatements';
import { attachments, changeRequests, projectMembers, projects, requestConditions, requestRevisions, trailEvents, users } from '../../db/schema';
import { deskDueAt, deskOf } from '../../shared/requests/deskClock';
import type { RequestSort } from '../../shared/requests/listQuery';
import type { AttachmentSummary, RequestSummary } from '../../shared/requests/types';
import type { DeskDueDays } from '../../shared/workflow/desks';
import { narrowReaderProjects, projectsOfReader } from './readerBreadth';
import type { Role } from '../../shared/roles';

type Executor = Database | Transaction;

const eorUsers = aliasedTable(users, 'eor_users');

const summaryColumns = {
  id: changeRequests.id,
  number: changeRequests.number,
  type: changeRequests.type,
  title: changeRequests.title,
  state: changeRequests.state,
  version: changeRequests.version,
  currentRevision: changeRequests.currentRevision,
  deskSince: changeRequests.deskSince,
  createdAt: changeRequests.createdAt,
  updatedAt: changeRequests.updatedAt,
  projectId: projects.id,
  projectCode: projects.code,
  projectName: projects.name,
  structureNumber: projects.structureNumber,
  deskDueDays: projects.deskDueDays,
  filedById: users.id,
  filedByName: users.name,
  filedByOrganization: users.organization,
  eorId: eorUsers.id,
  eorName: eorUsers.name,
  eorOrganization: eorUsers.organization,
};

function summaryQuery(db: Executor) {
  return db
    .select(summaryColumns)
    .from(changeRequests)
    .innerJoin(projects, eq(projects.id, changeRequests.projectId))
    .innerJoin(users, eq(users.id, changeRequests.filedById))
    .leftJoin(eorUsers, eq(eorUsers.id, changeRequests.assignedEorId));
}

type SummaryRow = {
  id: string;
  number: string;
  type: string;
  title: string;
  state: string;
  version: number;
  currentRevision: number;
  deskSince: Date;
  createdAt: Date;
  updatedAt: Date;
  projectId: string;
  projectCode: string;
  projectName: string;
  structureNumber: string;
  deskDueDays: DeskDueDays;
  filedById: string;
  filedByName: string;
  filedByOrganization: string | null;
  eorId: string | null;
  eorName: string | null;
  eorOrganization: string | null;
};

function toSummary(row: SummaryRow, now: Date = new Date()): RequestSummary {
  const dueAt = deskDueAt(row.state, row.deskSince, row.deskDueDays);
  return {
    id: row.id,
    number: row.number,
    type: row.type,
    title: row.title,
    state: row.state,
    version: row.version,
    currentRevision: row.currentRevision,
    project: { id: row.projectId, code: row.projectCode, name: row.projectName, structureNumber: row.structureNumber },
    filedBy: { id: row.filedById, name: row.filedByName, organization: row.filedByOrganization },
    assignedEor: row.eorId ? { id: row.eorId, name: row.eorName ?? '', organization: row.eorOrganization } : null,
    deskSince: row.deskSince.toISOString(),
    desk: deskOf(row.state),
    dueAt: dueAt?.toISOString() ?? null,
    overdue: dueAt !== null && dueAt.getTime() < now.getTime(),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export type RequestFilter = {
  // Projects the reader may see; undefined means every project (auditors).
  projectIds?: string[];
  // Only projects this person is a member of, looked up inside the query (a reader on two
  // thousand projects would otherwise send two thousand ids, and wait for them to be read first).
  memberId?: string;
  states?: string[];
  // Only requests routed to this engineer of record (their desk), when set.
  assignedEorId?: string;
  type?: string;
  projectId?: string;
  text?: string;
};

// The order of a page and the key its cursor carries. Keys are read back from the database as text,
// so a cursor keeps the full microsecond time and no row is repeated or skipped across pages.
export type RequestPageOrder = { sort: RequestSort; after?: { key: string; id: string } };

const sortColumns: Record<RequestSort, { key: SQL; descending: boolean }> = {
  // Settled requests fall due at 'infinity' (drizzle/0004_request_due_at.sql), so they sort last.
  due: { key: sql`${changeRequests.dueAt}`, descending: false },
  waiting: { key: sql`${changeRequests.deskSince}`, descending: false },
  newest: { key: sql`${changeRequests.createdAt}`, descending: true },
  updated: { key: sql`${changeRequests.updatedAt}`, descending: true },
};

// The projects whose name or structure number holds the text. Read first, so the request query
// gets their ids as values: as a subquery the planner cannot tell how many match and walks the
// whole register in desk order for a structure number that matches one project.
// Prepared: an agency's few thousand projects are read the same way for any words.
async function projectsNamed(db: Database, like: string): Promise<string[]> {
  const rows = await preparedRead(db, 'projects_named', () =>
    db
      .select({ id: projects.id })
      .from(projects)
      .where(or(ilike(projects.name, sql.placeholder('like')), ilike(projects.structureNumber, sql.placeholder('like'))))
      .prepare('projects_named'),
  ).execute({ like });
  const typed: { id: string }[] = rows;
  return typed.map((r) => r.id);
}

// The conditions, and whether one plan suits every reader of this shape of query: true for a reader
// on a few projects without a text search, whose projects are an array the planner cannot size
// anyway. Text and a reader on most projects get a plan made for their values.
async function filterConditions(db: Database, f: RequestFilter): Promise<{ where: (SQL | undefined)[]; onePlanFits: boolean }> {
  const where: (SQL | undefined)[] = [];
  let narrowReader = false;
  if (f.projectIds) where.push(f.projectIds.length ? inArray(changeRequests.projectId, f.projectIds) : sql`false`);
  if (f.memberId) {
    const memberProjects = db.select({ id: projectMembers.projectId }).from(projectMembers).where(eq(projectMembers.userId, f.memberId));
    narrowReader = (await projectsOfReader(db, f.memberId)) <= narrowReaderProjects;
    where.push(
      narrowReader
        ? sql`${changeRequests.projectId} = any(array(${memberProjects}))`
        : inArray(changeRequests.projectId, memberProjects),
    );
  }
  if (f.states) where.push(f.states.length ? inArray(changeRequests.state, f.states) : sql`false`);
  if (f.assignedEorId) where.push(eq(changeRequests.assignedEorId, f.assignedEorId));
  if (f.type) where.push(eq(changeRequests.type, f.type));
  if (f.projectId) where.push(eq(changeRequests.projectId, f.projectId));
  if (f.text) {
    const like = `%${f.text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    // Title and number through their trigram indexes, the project's words through its ids.
    const named = await projectsNamed(db, like);
    where.push(or(ilike(changeRequests.title, like), ilike(changeRequests.number, like), named.length ? inArray(changeRequests.projectId, named) : undefined));
  }
  return { where, onePlanFits: narrowReader && !f.text };
}

// A page in two round trips: the ids in order from change_requests alone (a short query the planner
// fits to the reader: per project for a few projects, along the due-date index for most of them),
// then their summaries by id through one prepared statement. As one query with the joins its
// planning alone took longer (1.5 ms) than reading the page.
export async function listRequests(db: Database, f: RequestFilter, order: RequestPageOrder, limit: number): Promise<{ summary: RequestSummary; sortKey: string }[]> {
  const { key, descending } = sortColumns[order.sort];
  const { where, onePlanFits } = await filterConditions(db, f);
  if (order.after) {
    const k = sql`${order.after.key}::timestamptz`;
    where.push(
      descending
        ? sql`(${key} < ${k} or (${key} = ${k} and ${changeRequests.id} < ${order.after.id}))`
        : sql`(${key} > ${k} or (${key} = ${k} and ${changeRequests.id} > ${order.after.id}))`,
    );
  }
  const pageQuery = db
    .select({ id: changeRequests.id, sortKey: sql<string>`(${key})::text`.as('sort_key') })
    .from(changeRequests)
    .where(and(...where))
    .orderBy(descending ? desc(key) : asc(key), descending ? desc(changeRequests.id) : asc(changeRequests.id))
    .limit(limit);
  // Where one plan fits, the statement is named after its text, so each connection parses and
  // plans a desk's shape once (0.5 ms of PostgreSQL's 1 ms for a section engineer's desk page).
  const page = onePlanFits ? await namedPage(db, pageQuery.toSQL()) : await pageQuery;
  if (page.length === 0) return [];
  const rows = await preparedRead(db, 'request_summaries', () =>
    summaryQuery(db)
      .where(sql`${changeRequests.id} = any(${sql.placeholder('ids')}::uuid[])`)
      .prepare('request_summaries'),
  ).execute({ ids: page.map((p) => p.id) });
  const typed: SummaryRow[] = rows;
  const byId = new Map(typed.map((row) => [row.id, row]));
  const now = new Date();
  // A request gone between the two reads (none are deleted today) is left out rather than invented.
  return page.flatMap(({ id, sortKey }) => {
    const row = byId.get(id);
    return row ? [{ summary: toSummary(row, now), sortKey }] : [];
  });
}

// The page's ids through a statement named after its text: the same shape gets the same name on
// every connection, and pg sends the text only the first time on each.
async function namedPage(db: Database, query: { sql: string; params: unknown[] }): Promise<{ id: string; sortKey: string }[]> {
  const name = `list_${createHash('sha1').update(query.sql).digest('hex').slice(0, 20)}`;
  const rows = await runNamed<{ id: string; sort_key: string }>(db, name, query.sql, query.params);
  return rows.map((r) => ({ id: r.id, sortKey: r.sort_key }));
}

// How many requests match, per state, and how many are past due at their desk.
export async function countRequests(db: Database, f: RequestFilter): Promise<{ state: string; n: number; overdue: number }[]> {
  return db
    .select({
      state: changeRequests.state,
      n: count(),
      overdue: sql<number>`(count(*) filter (where ${changeRequests.dueAt} < now()))::int`,
    })
    .from(changeRequests)
    .where(and(...(await filterConditions(db, f)).where))
    .groupBy(changeRequests.state);
}

export async function requestSummary(db: Executor, id: string): Promise<RequestSummary | null> {
  const [row] = await summaryQuery(db).where(eq(changeRequests.id, id)).limit(1);
  return row ? toSummary(row) : null;
}

// The reads of one request are prepared statements: built once per database handle (drizzle's
// query building was a fifth of a detail read's time) and named, so PostgreSQL parses them once per
// connection and, after five runs, plans them once (a generic plan), which suits a lookup by id.
// Lists are not prepared: their best plan depends on the reader (a generic plan made for readers of
// a few projects took 180 ms, not 1.3 ms, for central office on all 2,000), a search's on its words.
const preparedReads = new WeakMap<Executor, Map<string, unknown>>();
function preparedRead<P>(db: Executor, name: string, prepare: () => P): P {
  let byName = preparedReads.get(db);
  if (!byName) preparedReads.set(db, (byName = new Map()));
  let statement = byName.get(name) as P | undefined;
  if (!statement) byName.set(name, (statement = prepare()));
  return statement;
}

// One request for one reader in a single round trip: its summary, the columns the workflow facts
// and the record need, and whether the reader is on its project (null reader: nobody is).
export async function requestForReader(db: Executor, id: string, readerId: string | null) {
  const prepare = (name: string, member: SQL<boolean>) =>
    db
      .select({
        ...summaryColumns,
        decision: changeRequests.decision,
        assignedEorId: changeRequests.assignedEorId,
        majorChange: changeRequests.majorChange,
        federalConcurrenceAttachmentId: changeRequests.federalConcurrenceAttachmentId,
        federalAid: projects.federalAid,
        member: member.as('member'),
      })
      .from(changeRequests)
      .innerJoin(projects, eq(projects.id, changeRequests.projectId))
      .innerJoin(users, eq(users.id, changeRequests.filedById))
      .leftJoin(eorUsers, eq(eorUsers.id, changeRequests.assignedEorId))
      .where(eq(changeRequests.id, sql.placeholder('id')))
      .limit(1)
      .prepare(name);
  const isMember = sql<boolean>`exists (select 1 from ${projectMembers} where ${projectMembers.projectId} = ${changeRequests.projectId} and ${projectMembers.userId} = ${sql.placeholder('readerId')})`;
  const rows = readerId
    ? await preparedRead(db, 'request_for_reader', () => prepare('request_for_reader', isMember)).execute({ id, readerId })
    : await preparedRead(db, 'request_for_record', () => prepare('request_for_record', sql<boolean>`false`)).execute({ id });
  const typed: (SummaryRow & {
    decision: (typeof changeRequests.$inferSelect)['decision'];
    assignedEorId: string | null;
    majorChange: boolean | null;
    federalConcurrenceAttachmentId: string | null;
    federalAid: boolean;
    member: boolean;
  })[] = rows;
  const row = typed[0];
  if (!row) return null;
  return {
    summary: toSummary(row),
    decision: row.decision,
    assignedEorId: row.assignedEorId,
    majorChange: row.majorChange,
    federalConcurrence: row.federalConcurrenceAttachmentId !== null,
    federalAid: row.federalAid,
    member: row.member,
  };
}

export async function lockRequest(tx: Transaction, id: string) {
  const [row] = await tx
    .select({ request: changeRequests, federalAid: projects.federalAid, projectName: projects.name, structureNumber: projects.structureNumber })
    .from(changeRequests)
    .innerJoin(projects, eq(projects.id, changeRequests.projectId))
    .where(eq(changeRequests.id, id))
    .for('update', { of: changeRequests });
  return row ?? null;
}

export async function requestRow(db: Executor, id: string) {
  const [row] = await db
    .select({ request: changeRequests, federalAid: projects.federalAid, deskDueDays: projects.deskDueDays })
    .from(changeRequests)
    .innerJoin(projects, eq(projects.id, changeRequests.projectId))
    .where(eq(changeRequests.id, id));
  return row ?? null;
}

export async function openConditionCount(db: Executor, requestId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(requestConditions)
    .where(and(eq(requestConditions.requestId, requestId), isNull(requestConditions.satisfiedAt)));
  return row?.n ?? 0;
}

export async function revisionsOf(db: Executor, requestId: string) {
  return preparedRead(db, 'request_revisions', () =>
    db.select().from(requestRevisions).where(eq(requestRevisions.requestId, sql.placeholder('requestId'))).orderBy(asc(requestRevisions.revision)).prepare('request_revisions'),
  ).execute({ requestId });
}

export async function currentRevisionRow(db: Executor, requestId: string, revision: number) {
  const [row] = await db
    .select()
    .from(requestRevisions)
    .where(and(eq(requestRevisions.requestId, requestId), eq(requestRevisions.revision, revision)));
  return row ?? null;
}

export function toAttachmentSummary(a: typeof attachments.$inferSelect, uploaderName: string): AttachmentSummary {
  return {
    id: a.id,
    revision: a.revision,
    purpose: a.purpose,
    fileName: a.fileName,
    contentType: a.contentType,
    sizeBytes: a.sizeBytes,
    sha256: a.sha256,
    uploadedBy: uploaderName,
    uploadedAt: a.uploadedAt.toISOString(),
  };
}

export async function attachmentsOf(db: Executor, requestId: string) {
  return preparedRead(db, 'request_attachments', () =>
    db
      .select({ attachment: attachments, uploaderName: users.name })
      .from(attachments)
      .innerJoin(users, eq(users.id, attachments.uploadedById))
      .where(eq(attachments.requestId, sql.placeholder('requestId')))
      .orderBy(asc(attachments.uploadedAt))
      .prepare('request_attachments'),
  ).execute({ requestId });
}

export async function attachmentOfRequest(db: Executor, requestId: string, attachmentId: string) {
  const [row] = await db
    .select()
    .from(attachments)
    .where(and(eq(attachments.id, attachmentId), eq(attachments.requestId, requestId)));
  return row ?? null;
}

export async function conditionsOf(db: Executor, requestId: string) {
  return preparedRead(db, 'request_conditions', () =>
    db
      .select({ condition: requestConditions, satisfierName: users.name, satisfierOrganization: users.organization })
      .from(requestConditions)
      .leftJoin(users, eq(users.id, requestConditions.satisfiedById))
      .where(eq(requestConditions.requestId, sql.placeholder('requestId')))
      .orderBy(asc(requestConditions.seq))
      .prepare('request_conditions'),
  ).execute({ requestId });
}

export async function trailOf(db: Executor, requestId: string) {
  return preparedRead(db, 'request_trail', () =>
    db
      .select({ event: trailEvents, actorName: users.name, actorOrganization: users.organization })
      .from(trailEvents)
      .innerJoin(users, eq(users.id, trailEvents.actorId))
      .where(eq(trailEvents.requestId, sql.placeholder('requestId')))
      .orderBy(asc(trailEvents.seq))
      .prepare('request_trail'),
  ).execute({ requestId });
}

export async function attachmentWithProject(db: Database, attachmentId: string) {
  const [row] = await db
    .select({ attachment: attachments, projectId: changeRequests.projectId, state: changeRequests.state })
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

export async function membersWithRole(db: Executor, projectId: string, role: Role) {
  return db
    .select({ id: users.id, name: users.name, email: users.email, organization: users.organization })
    .from(users)
    .innerJoin(projectMembers, eq(projectMembers.userId, users.id))
    .where(and(eq(projectMembers.projectId, projectId), eq(users.role, role)))
    .orderBy(asc(users.name));
}

export async function userById(db: Executor, id: string) {
  const [row] = await db.select().from(users).where(eq(users.id, id));
  return row ?? null;
}

export async function projectById(db: Executor, projectId: string) {
  const [row] = await db.select().from(projects).where(eq(projects.id, projectId));
  return row ?? null;
}
