// The administrator's calls: people, their roles and projects, invitations. Every route here is
// refused with 403 to anyone who is not an administrator, before anything is read.
import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import type { Database } from '../../db/client';
import { inviteSchema, memberAddSchema, personUpdateSchema, projectSettingsSchema } from '../../shared/people/schemas';
import { actorOf } from '../auth/requireActor';
import { HttpError } from '../http/errors';
import type { Mailer } from '../mail/mailer';
import { invite, listOpenInvitations, resendInvitation, withdraw } from './invitationService';
import { parseBody, pathId } from './parseBody';
import { listPeople } from './peopleRepository';
import { addProjectMember, changePerson, changeProjectSettings, removeProjectMember } from './peopleService';
import { listProjects } from './projectAdminRepository';

const uuid = z.uuid();
const projectId = (value: unknown) => {
  if (!uuid.safeParse(value).success) throw new HttpError(404, 'project_not_found', 'No project has that id.');
  return value as string;
};
const invitationId = (value: unknown) => {
  if (!uuid.safeParse(value).success) throw new HttpError(404, 'invitation_not_found', 'No open invitation has that id.');
  return value as string;
};

const adminOnly: RequestHandler = (req, _res, next) => {
  next(actorOf(req).role === 'admin' ? undefined : new HttpError(403, 'admin_only', 'Only administrators manage people and projects.'));
};

export function adminRoutes(deps: { db: Database; mailer: Mailer; publicUrl: string }): Router {
  const { db } = deps;
  const router = Router();
  router.use('/api/admin', adminOnly);

  router.get('/api/admin/people', async (_req, res) => {
    res.json(await listPeople(db));
  });
  router.patch('/api/admin/people/:id', async (req, res) => {
    const update = parseBody(personUpdateSchema, req.body, 'The person was not changed; see the fields named.');
    res.json(await changePerson(db, actorOf(req), pathId(req.params.id, 'person'), update));
  });

  router.get('/api/admin/projects', async (_req, res) => {
    res.json(await listProjects(db));
  });
  router.patch('/api/admin/projects/:id', async (req, res) => {
    const settings = parseBody(projectSettingsSchema, req.body, 'The due days were not saved; see the desks named.');
    res.json(await changeProjectSettings(db, projectId(req.params.id), settings));
  });
  router.post('/api/admin/projects/:id/members', async (req, res) => {
    const { userId } = parseBody(memberAddSchema, req.body, 'Choose the person to add.');
    res.json(await addProjectMember(db, projectId(req.params.id), userId));
  });
  router.delete('/api/admin/projects/:id/members/:userId', async (req, res) => {
    res.json(await removeProjectMember(db, projectId(req.params.id), pathId(req.params.userId, 'person')));
  });

  router.get('/api/admin/invitations', async (_req, res) => {
    res.json(await listOpenInvitations(db));
  });
  router.post('/api/admin/invitations', async (req, res) => {
    const input = parseBody(inviteSchema, req.body, 'The invitation was not sent; see the fields named.');
    res.status(201).json(await invite(deps, actorOf(req), input));
  });
  router.post('/api/admin/invitations/:id/resend', async (req, res) => {
    res.json(await resendInvitation(deps, actorOf(req), invitationId(req.params.id)));
  });
  router.delete('/api/admin/invitations/:id', async (req, res) => {
    await withdraw(db, invitationId(req.params.id));
    res.status(204).end();
  });
  return router;
}
