// Reads and writes of people as the administrator sees them: the account, its role and the
// projects it belongs to.
import { asc, eq, inArray } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { projectMembers, projects, users } from '../../db/schema';
import type { Role } from '../../shared/roles';
import type { PersonRow, ProjectRef } from '../../shared/people/types';

const personColumns = { id: users.id, name: users.name, email: users.email, role: users.role, organization: users.organization };

export async function listPeople(db: Database): Promise<PersonRow[]> {
  const people = await db.select(personColumns).from(users).orderBy(asc(users.name), asc(users.email));
  const memberships = await db
    .select({ userId: projectMembers.userId, id: projects.id, code: projects.code, name: projects.name })
    .from(projectMembers)
    .innerJoin(projects, eq(projects.id, projectMembers.projectId))
    .orderBy(asc(projects.code));
  const byUser = new Map<string, ProjectRef[]>();
  for (const { userId, ...project } of memberships) byUser.set(userId, [...(byUser.get(userId) ?? []), project]);
  return people.map((p) => ({ ...p, projects: byUser.get(p.id) ?? [] }));
}

export async function findPerson(db: Database, id: string): Promise<PersonRow | null> {
  const [person] = await db.select(personColumns).from(users).where(eq(users.id, id));
  if (!person) return null;
  const projectRows = await db
    .select({ id: projects.id, code: projects.code, name: projects.name })
    .from(projectMembers)
    .innerJoin(projects, eq(projects.id, projectMembers.projectId))
    .where(eq(projectMembers.userId, id))
    .orderBy(asc(projects.code));
  return { ...person, projects: projectRows };
}

export async function updatePerson(db: Database, id: string, change: { role?: Role; organization?: string | null }): Promise<void> {
  await db.update(users).set({ ...change, updatedAt: new Date() }).where(eq(users.id, id));
}

export async function peopleExist(db: Database, ids: string[]): Promise<boolean> {
  if (ids.length === 0) return true;
  const rows = await db.select({ id: users.id }).from(users).where(inArray(users.id, ids));
  return rows.length === new Set(ids).size;
}
