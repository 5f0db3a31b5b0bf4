// Projects as the administrator manages them: every project, its members and its desk due days.
import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { projectMembers, projects, users } from '../../db/schema';
import type { AdminProject, ProjectMember, ProjectRef } from '../../shared/people/types';
import type { DeskDueDays } from '../../shared/workflow/desks';

const projectColumns = { id: projects.id, code: projects.code, name: projects.name, structureNumber: projects.structureNumber, deskDueDays: projects.deskDueDays };

async function membersOf(db: Database, projectIds: string[]): Promise<Map<string, ProjectMember[]>> {
  const byProject = new Map<string, ProjectMember[]>();
  if (projectIds.length === 0) return byProject;
  const rows = await db
    .select({ projectId: projectMembers.projectId, id: users.id, name: users.name, email: users.email, role: users.role, organization: users.organization })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(inArray(projectMembers.projectId, projectIds))
    .orderBy(asc(users.name));
  for (const { projectId, ...member } of rows) byProject.set(projectId, [...(byProject.get(projectId) ?? []), member]);
  return byProject;
}

export async function listProjects(db: Database): Promise<AdminProject[]> {
  const rows = await db.select(projectColumns).from(projects).orderBy(asc(projects.code));
  const members = await membersOf(db, rows.map((r) => r.id));
  return rows.map((r) => ({ ...r, members: members.get(r.id) ?? [] }));
}

export async function findProject(db: Database, id: string): Promise<AdminProject | null> {
  const [row] = await db.select(projectColumns).from(projects).where(eq(projects.id, id));
  if (!row) return null;
  return { ...row, members: (await membersOf(db, [id])).get(id) ?? [] };
}

export async function projectRefs(db: Database | Transaction, ids: string[]): Promise<ProjectRef[]> {
  if (ids.length === 0) return [];
  return db.select({ id: projects.id, code: projects.code, name: projects.name }).from(projects).where(inArray(projects.id, ids)).orderBy(asc(projects.code));
}

export async function addMember(db: Database | Transaction, projectId: string, userId: string): Promise<void> {
  await db.insert(projectMembers).values({ projectId, userId }).onConflictDoNothing();
}

export async function removeMember(db: Database, projectId: string, userId: string): Promise<void> {
  await db.delete(projectMembers).where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)));
}

export async function setDeskDueDays(db: Database, projectId: string, deskDueDays: DeskDueDays): Promise<void> {
  await db.update(projects).set({ deskDueDays }).where(eq(projects.id, projectId));
}
