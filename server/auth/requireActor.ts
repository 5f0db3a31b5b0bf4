// Every API route but health and sign-in needs a signed-in actor; this resolves the session once
// and narrows it to our Actor type for the handlers after it.
import type { Request, RequestHandler } from 'express';
import { fromNodeHeaders } from 'better-auth/node';
import type { Auth } from './auth';
import { HttpError } from '../http/errors';
import { isRole } from '../../shared/roles';
import type { Actor } from '../../shared/requests/types';

const actorKey = Symbol('actor');
type WithActor = Request & { [actorKey]?: Actor };

export function requireActor(auth: Auth): RequestHandler {
  return async (req, _res, next) => {
    try {
      const session = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
      if (!session) throw new HttpError(401, 'signed_out', 'Sign in to continue.');
      const { id, name, email, role, organization } = session.user as typeof session.user & { role: unknown; organization?: string | null };
      if (!isRole(role)) throw new HttpError(403, 'no_role', 'Your account has no role yet; ask an administrator.');
      (req as WithActor)[actorKey] = { id, name, email, role, organization: organization ?? null };
      next();
    } catch (err) {
      next(err);
    }
  };
}

export function actorOf(req: Request): Actor {
  const actor = (req as WithActor)[actorKey];
  if (!actor) throw new HttpError(401, 'signed_out', 'Sign in to continue.');
  return actor;
}
