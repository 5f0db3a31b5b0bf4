// Reading conditions across requests, each with its request, its evidence and the approval that
// set it. The approval is the request's latest approve_with_conditions trail event, taken through a
// lateral join so each request's trail is searched once, by its own index.
import { aliasedTable, and, asc, desc, eq, gt, inArray, isNull, or, sql, type SQL } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { attachments, changeRequests, projects, requestConditions, trailEvents, users } from '../../db/schema';
import type { ConditionListItem } from '../../shared/conditions/types';

const satisfiers = aliasedTable(users, 'satisfiers');
const approvers = aliasedTable(users, 'approvers');

export type ConditionFilter = {
  // Projects the reader may see; undefined means every project (auditors).
  projectIds?: string[];
  projectId?: string;
  // Met conditions are included only when satisfied after this instant; undefined: open ones only.
  metSince?: Date;
  limit: number;
};

export async function listConditions(db: Database, f: ConditionFilter): Promise<ConditionListItem[]> {
  const approval = db
    .select({ at: sql<Date>`${trailEvents.createdAt}`.as('approved_at'), actorId: sql<string>`${trailEvents.actorId}`.as('approved_by_id') })
    .from(trailEvents)
    .where(and(eq(trailEvents.requestId, changeRequests.id), eq(trailEvents.eventType, 'approve_with_conditions')))
    .orderBy(desc(trailEvents.seq))
    .limit(1)
    .as('approval');

  const where: (SQL | undefined)[] = [];
  if (f.projectIds) where.push(f.projectIds.length ? inArray(changeRequests.projectId, f.projectIds) : sql`false`);
  if (f.projectId) where.push(eq(changeRequests.projectId, f.projectId));
  where.push(f.metSince ? or(isNull(requestConditions.satisfiedAt), gt(requestConditions.satisfiedAt, f.metSince)) : isNull(requestConditions.satisfiedAt));

  const rows = await db
    .select({
      condition: requestConditions,
      satisfierName: satisfiers.name,
      satisfierOrganization: satisfiers.organization,
      evidenceFileName: attachments.fileName,
      evidenceContentType: attachments.contentType,
      requestId: changeRequests.id,
      number: changeRequests.number,
      title: changeRequests.title,
      state: changeRequests.state,
      version: changeRequests.version,
      projectId: projects.id,
      projectName: projects.name,
      structureNumber: projects.structureNumber,
      approvedAt: approval.at,
      approverId: approvers.id,
      approverName: approvers.name,
      approverOrganization: approvers.organization,
    })
    .from(requestConditions)
    .innerJoin(changeRequests, eq(changeRequests.id, requestConditions.requestId))
    .innerJoin(projects, eq(projects.id, changeRequests.projectId))
    .leftJoin(satisfiers, eq(satisfiers.id, requestConditions.satisfiedById))
    .leftJoin(attachments, eq(attachments.id, requestConditions.evidenceAttachmentId))
    .leftJoinLateral(approval, sql`true`)
    .leftJoin(approvers, eq(approvers.id, approval.actorId))
    .where(and(...where))
    .orderBy(sql`${approval.at} asc nulls last`, asc(changeRequests.number), asc(requestConditions.seq))
    .limit(f.limit);

  return rows.map((r) => {
    const c = r.condition;
    return {
      condition: {
        id: c.id,
        seq: c.seq,
        text: c.text,
        dueBefore: c.dueBefore,
        satisfied: c.satisfiedAt !== null,
        satisfiedBy: c.satisfiedById ? { id: c.satisfiedById, name: r.satisfierName ?? '', organization: r.satisfierOrganization } : null,
        satisfiedAt: c.satisfiedAt?.toISOString() ?? null,
        note: c.note,
        evidenceAttachmentId: c.evidenceAttachmentId,
        evidence: c.evidenceAttachmentId && r.evidenceFileName
          ? { id: c.evidenceAttachmentId, fileName: r.evidenceFileName, contentType: r.evidenceContentType ?? 'application/octet-stream' }
          : null,
      },
      request: {
        id: r.requestId,
        number: r.number,
        title: r.title,
        state: r.state,
        version: r.version,
        projectId: r.projectId,
        projectName: r.projectName,
        structureNumber: r.structureNumber,
      },
      approvedAt: r.approvedAt ? new Date(r.approvedAt).toISOString() : null,
      approvedBy: r.approverId ? { id: r.approverId, name: r.approverName ?? '', organization: r.approverOrganization } : null,
    };
  });
}
