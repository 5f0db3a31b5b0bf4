// The invited person's calls, made before they have an account (so outside the signed-in routes).
// The token travels in the body, never the path, so it stays out of access logs.
import { Router } from 'express';
import type { Database } from '../../db/client';
import { acceptInvitationSchema, invitationTokenSchema } from '../../shared/people/schemas';
import { acceptInvitation, previewInvitation } from './invitationService';
import { parseBody } from './parseBody';

export function invitationRoutes(db: Database): Router {
  const router = Router();
  router.post('/api/invitations/preview', async (req, res) => {
    const { token } = parseBody(invitationTokenSchema, req.body, 'This invitation link is not complete.');
    res.json(await previewInvitation(db, token));
  });
  router.post('/api/invitations/accept', async (req, res) => {
    const input = parseBody(acceptInvitationSchema, req.body, 'Your account was not made yet; see the fields named.');
    res.status(201).json(await acceptInvitation(db, input));
  });
  return router;
}
