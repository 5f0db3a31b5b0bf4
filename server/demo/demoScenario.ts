// Loads the demo scenario: the invented agency's people and bridge projects, and fifteen requests
// replayed through the product's own services at the days of their invented history.
import { count, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { changeRequests, projectMembers, projects } from '../../db/schema';
import type { Actor } from '../../shared/requests/types';
import { upsertAccount } from '../people/accountRepository';
import type { ObjectStore } from '../storage/objectStore';
import { demoPassword, demoPeople, demoProjects, type DemoPersonKey, type DemoProjectKey } from './demoCast';
import { demoClock } from './demoClock';
import { runStory } from './storyRunner';
import type { RequestStory, StoryCalendar } from './storyTypes';
import { harrowRoadStories } from './stories/harrowRoad';
import { millRunStories } from './stories/millRun';
import { pellamCreekStories } from './stories/pellamCreek';

export { demoEmail, demoPassword, demoProject, demoPeople, demoProjects } from './demoCast';

export type DemoDeps = { db: Database; store: ObjectStore; publicUrl: string; now?: Date };
export type DemoSeedReport = { projects: Record<DemoProjectKey, { id: string; requestsAdded: number }>; people: Record<DemoPersonKey, string> };

export function demoStories(calendar: StoryCalendar): RequestStory[] {
  // Filed oldest first, so request numbers follow the order the requests were filed in.
  return [...pellamCreekStories(calendar), ...harrowRoadStories(calendar), ...millRunStories(calendar)].sort(
    (a, b) => b.filedOn.daysAgo - a.filedOn.daysAgo || a.filedOn.at.localeCompare(b.filedOn.at),
  );
}

// Idempotent: people and projects are brought up to date in place, and a project's requests are
// replayed only when it has none, so running it again adds nothing.
export async function seedDemo(deps: DemoDeps): Promise<DemoSeedReport> {
  const { db } = deps;
  const people = {} as Record<DemoPersonKey, Actor>;
  for (const [key, person] of Object.entries(demoPeople) as [DemoPersonKey, (typeof demoPeople)[DemoPersonKey]][]) {
    const id = await upsertAccount(db, { email: person.email, name: person.name, role: person.role, organization: person.organization, password: demoPassword });
    people[key] = { id, name: person.name, email: person.email, role: person.role, organization: person.organization };
  }

  const projectIds = {} as Record<DemoProjectKey, string>;
  for (const [key, facts] of Object.entries(demoProjects) as [DemoProjectKey, (typeof demoProjects)[DemoProjectKey]][]) {
    const { structure: _structure, spansFt: _spansFt, ...row } = facts;
    const [project] = await db.insert(projects).values(row).onConflictDoUpdate({ target: projects.code, set: row }).returning({ id: projects.id });
    projectIds[key] = project!.id;
  }
  const memberships = (Object.keys(demoPeople) as DemoPersonKey[]).flatMap((key) => demoPeople[key].projects.map((p) => ({ projectId: projectIds[p], userId: people[key].id })));
  await db.insert(projectMembers).values(memberships).onConflictDoNothing();

  const untouched = new Set<DemoProjectKey>();
  for (const key of Object.keys(projectIds) as DemoProjectKey[]) {
    const [held] = await db.select({ n: count() }).from(changeRequests).where(eq(changeRequests.projectId, projectIds[key]));
    if ((held?.n ?? 0) === 0) untouched.add(key);
  }
  const clock = demoClock(deps.now);
  const added: Record<DemoProjectKey, number> = { pellamCreek: 0, harrowRoad: 0, millRun: 0 };
  for (const story of demoStories(clock)) {
    if (!untouched.has(story.project)) continue;
    await runStory({ db, store: deps.store, publicUrl: deps.publicUrl, clock, people, projectIds }, story);
    added[story.project] += 1;
  }

  return {
    projects: Object.fromEntries((Object.keys(projectIds) as DemoProjectKey[]).map((k) => [k, { id: projectIds[k], requestsAdded: added[k] }])) as DemoSeedReport['projects'],
    people: Object.fromEntries((Object.keys(people) as DemoPersonKey[]).map((k) => [k, people[k].id])) as Record<DemoPersonKey, string>,
  };
}
