// GET /api/dev/mail: what the local SMTP catcher has caught, for people trying the product and for
// tests. Never mounted in production.
import { Router } from 'express';
import { HttpError } from '../http/errors';

type CaughtMail = { to: string[]; subject: string; text: string; sentAt: string };

export function devMailRoutes(catcherUrl: string): Router {
  const router = Router();
  router.get('/api/dev/mail', async (_req, res) => {
    let caught: CaughtMail[];
    try {
      const answer = await fetch(`${catcherUrl}/messages`, { signal: AbortSignal.timeout(3000) });
      caught = (await answer.json()) as CaughtMail[];
    } catch {
      throw new HttpError(503, 'mail_catcher_down', 'The local mail catcher is not running.');
    }
    res.json(caught.map(({ to, subject, text, sentAt }) => ({ to: to.join(', '), subject, text, sentAt })));
  });
  return router;
}
