// What an administrator may change about people and projects, and the rules that keep it sane.
import type { Database } from '../../db/client';
import type { PersonUpdate, ProjectSettings } from '../../shared/people/schemas';
import type { AdminProject, PersonRow } from '../../shared/people/types';
import type { Actor } from '../../shared/requests/types';
import type { Role } from '../../shared/roles';
import { forgetSessionsOf } from '../auth/sessionCache';
import { HttpError } from '../http/errors';
import { findPerson, updatePerson } from './peopleRepository';
import { addMember, findProject, removeMember, setDeskDueDays } from './projectAdminRepository';

async function personOr404(db: Database, id: string): Promise<PersonRow> {
  const person = await findPerson(db, id);
  if (!person) throw new HttpError(404, 'person_not_found', 'No person has that id.');
  return person;
}

async function projectOr404(db: Database, id: string): Promise<AdminProject> {
  const project = await findProject(db, id);
  if (!project) throw new HttpError(404, 'project_not_found', 'No project has that id.');
  return project;
}

export async function changePerson(db: Database, actor: Actor, id: string, update: PersonUpdate): Promise<PersonRow> {
  const person = await personOr404(db, id);
  // An administrator who demoted themself could leave nobody able to undo it.
  if (update.role !== undefined && update.role !== person.role && id === actor.id) {
    throw new HttpError(409, 'own_role', 'Another administrator must change your own role.', { role: 'You cannot change your own role.' });
  }
  const change: { role?: Role; organization?: string | null } = {};
  if (update.role !== undefined) change.role = update.role;
  if (update.organization !== undefined) change.organization = update.organization || null;
  await updatePerson(db, id, change);
  // The person's open sessions act with the new role from their very next request.
  forgetSessionsOf(id);
  return personOr404(db, id);
}

export async function addProjectMember(db: Database, projectId: string, userId: string): Promise<AdminProject> {
  await projectOr404(db, projectId);
  await personOr404(db, userId);
  await addMember(db, projectId, userId);
  return projectOr404(db, projectId);
}

export async function removeProjectMember(db: Database, projectId: string, userId: string): Promise<AdminProject> {
  await projectOr404(db, projectId);
  await removeMember(db, projectId, userId);
  return projectOr404(db, projectId);
}

export async function changeProjectSettings(db: Database, projectId: string, settings: ProjectSettings): Promise<AdminProject> {
  await projectOr404(db, projectId);
  await setDeskDueDays(db, projectId, settings.deskDueDays);
  return projectOr404(db, projectId);
}
