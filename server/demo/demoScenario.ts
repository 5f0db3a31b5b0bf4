// The demo scenario: an invented state highway agency, county, bridge, firms and people.
// None of them is real; they exist so the product can be tried end to end.
import type { Database } from '../../db/client';
import { projectMembers, projects } from '../../db/schema';
import type { Role } from '../../shared/roles';
import { upsertAccount } from '../people/accountRepository';
import type { Actor } from '../../shared/requests/types';
import { seedDemoRequests } from './demoRequests';

export const demoPassword = 'spanrelay-demo';
export const demoEmail = (role: Role) => `${role}@demo.spanrelay.test`;

const agency = 'Marrowfield State Highway Department';

export const demoPeople: { role: Role; name: string; organization: string }[] = [
  { role: 'contractor', name: 'Dana Ostrow', organization: 'Corbel & Fane Constructors' },
  { role: 'section_engineer', name: 'Priya Halden', organization: `${agency}, Tallis Section` },
  { role: 'central_office', name: 'Marcus Trell', organization: `${agency}, Bridge Office` },
  { role: 'engineer_of_record', name: 'Ruth Caldera, P.E.', organization: 'Hollisford Span Engineers' },
  { role: 'field_inspector', name: 'Tomas Reyl', organization: `${agency}, Tallis Section` },
  { role: 'auditor', name: 'June Akers', organization: `${agency}, Internal Review` },
  { role: 'admin', name: 'Sam Pellow', organization: agency },
];

export const demoProject = {
  code: 'PC-0114',
  name: 'Pellam Creek Bridge, SR 9',
  structureNumber: '27-0114',
  featureCarried: 'State Route 9',
  featureCrossed: 'Pellam Creek',
  county: 'Tallis County',
  contractNumber: 'C-27-2026-08',
  contractorFirm: 'Corbel & Fane Constructors',
  section: 'Tallis Section',
};

// Idempotent: running it again updates the same people and project instead of duplicating them,
// and adds the demo requests only to a project that has none.
export async function seedDemo(db: Database, publicUrl = 'http://127.0.0.1:8081'): Promise<{ projectId: string; userIds: Record<Role, string> }> {
  const userIds = {} as Record<Role, string>;
  for (const person of demoPeople) {
    userIds[person.role] = await upsertAccount(db, { ...person, email: demoEmail(person.role), password: demoPassword });
  }
  const [project] = await db
    .insert(projects)
    .values(demoProject)
    .onConflictDoUpdate({ target: projects.code, set: { name: demoProject.name } })
    .returning({ id: projects.id });
  if (!project) throw new Error('demo project was not written');
  await db
    .insert(projectMembers)
    .values(Object.values(userIds).map((userId) => ({ projectId: project.id, userId })))
    .onConflictDoNothing();
  const people = Object.fromEntries(
    demoPeople.map((p) => [p.role, { id: userIds[p.role], name: p.name, email: demoEmail(p.role), role: p.role, organization: p.organization }]),
  ) as Record<Role, Actor>;
  await seedDemoRequests(db, project.id, people, publicUrl);
  return { projectId: project.id, userIds };
}
