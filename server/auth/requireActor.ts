// Every API route but health and sign-in needs a signed-in actor; this resolves the session once
// and narrows it to our Actor type for the handlers after it. Sessions are remembered for a few
// seconds per cookie (`sessionCache.ts`, which says what keeps that correct).
import type { Request, RequestHandler } from 'express';
import { fromNodeHeaders } from 'better-auth/node';
import type { Auth } from './auth';
import { sessionCache, type FoundSession, type SessionCache } from './sessionCache';
import { HttpError } from '../http/errors';
import { isRole } from '../../shared/roles';
import type { Actor } from '../../shared/requests/types';

const actorKey = Symbol('actor');
type WithActor = Request & { [actorKey]?: Actor };

async function lookUpSession(auth: Auth, req: Request): Promise<FoundSession | null> {
  const session = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
  if (!session) return null;
  const { id, name, email, role, organization } = session.user as typeof session.user & { role: unknown; organization?: string | null };
  return { person: { id, name, email, role, organization: organization ?? null }, expiresAt: new Date(session.session.expiresAt) };
}

// The session cookie's raw value, or null when there is none or more than one (then better-auth
// decides alone which it reads, and nothing is remembered).
export function sessionCookieValue(cookieHeader: string | undefined, name: string): string | null {
  if (!cookieHeader) return null;
  const prefix = `${name}=`;
  const values = cookieHeader
    .split(';')
    .map((part) => part.trim())
    .filter((part) => part.startsWith(prefix))
    .map((part) => part.slice(prefix.length));
  return values.length === 1 && values[0] ? values[0] : null;
}

export function requireActor(auth: Auth, cache: SessionCache = sessionCache): RequestHandler {
  const cookieName = auth.$context.then((context) => context.authCookies.sessionToken.name);
  return async (req, _res, next) => {
    try {
      const key = sessionCookieValue(req.headers.cookie, await cookieName);
      const lookUp = () => lookUpSession(auth, req);
      const person = key ? await cache.resolve(key, lookUp) : ((await lookUp())?.person ?? null);
      if (!person) throw new HttpError(401, 'signed_out', 'Sign in to continue.');
      const { id, name, email, role, organization } = person;
      if (!isRole(role)) throw new HttpError(403, 'no_role', 'Your account has no role yet; ask an administrator.');
      (req as WithActor)[actorKey] = { id, name, email, role, organization };
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
