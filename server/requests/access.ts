// Who may read a request: members of its project, and auditors, who trace every request. A draft
// is the contractor's own work until it is submitted: the agency's desks see a request from its
// submission on, auditors (who trace what became of every request) from its start.
import type { Database } from '../../db/client';
import type { Actor } from '../../shared/requests/types';
import { isProjectMember, memberProjectIds } from '../projects/projectRepository';
import type { Executor } from '../workflow/executor';

export async function mayRead(db: Executor, actor: Actor, projectId: string): Promise<boolean> {
  return actor.role === 'auditor' || (await isProjectMember(db, projectId, actor.id));
}

export const seesDrafts = (actor: Actor) => actor.role === 'contractor' || actor.role === 'auditor';

export async function mayReadRequest(db: Executor, actor: Actor, request: { projectId: string; state: string }): Promise<boolean> {
  if (request.state === 'drafting' && !seesDrafts(actor)) return false;
  return mayRead(db, actor, request.projectId);
}

// undefined: every project.
export async function readableProjectIds(db: Database, actor: Actor): Promise<string[] | undefined> {
  return actor.role === 'auditor' ? undefined : memberProjectIds(db, actor.id);
}
