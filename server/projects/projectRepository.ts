import { and, eq, asc } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { projects, projectMembers } from '../../db/schema';
import type { ProjectSummary } from '../../shared/requests/types';

const summaryColumns = {
  id: projects.id,
  code: projects.code,
  name: projects.name,
  structureNumber: projects.structureNumber,
  featureCarried: projects.featureCarried,
  featureCrossed: projects.featureCrossed,
  county: projects.county,
  federalAid: projects.federalAid,
};

export async function projectsOfMember(db: Database, userId: string): Promise<ProjectSummary[]> {
  return db
    .select(summaryColumns)
    .from(projects)
    .innerJoin(projectMembers, eq(projectMembers.projectId, projects.id))
    .where(eq(projectMembers.userId, userId))
    .orderBy(asc(projects.code));
}

export async function memberProjectIds(db: Database, userId: string): Promise<string[]> {
  const rows = await db.select({ id: projectMembers.projectId }).from(projectMembers).where(eq(projectMembers.userId, userId));
  return rows.map((r) => r.id);
}

export async function isProjectMember(db: Database | Transaction, projectId: string, userId: string): Promise<boolean> {
  const rows = await db
    .select({ projectId: projectMembers.projectId })
    .from(projectMembers)
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)))
    .limit(1);
  return rows.length > 0;
}
