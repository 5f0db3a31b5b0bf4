// Who may read a request: members of its project, and auditors, who trace every request.
import type { Database } from '../../db/client';
import type { Actor } from '../../shared/requests/types';
import { isProjectMember, memberProjectIds } from '../projects/projectRepository';
import type { Executor } from '../workflow/executor';

export async function mayRead(db: Executor, actor: Actor, projectId: string): Promise<boolean> {
  return actor.role === 'auditor' || (await isProjectMember(db, projectId, actor.id));
}

// undefined: every project.
export async function readableProjectIds(db: Database, actor: Actor): Promise<string[] | undefined> {
  return actor.role === 'auditor' ? undefined : memberProjectIds(db, actor.id);
}
