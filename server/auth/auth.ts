// better-auth, built once per app. Accounts are made by an administrator (or the demo seed), so
// public sign-up is off; `role` is stored on the user and can never be set by the user.
import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { APIError, createAuthMiddleware } from 'better-auth/api';
import { createSignInThrottle } from './signInThrottle';
import type { Database } from '../../db/client';
import * as schema from '../../db/schema';
import type { ServerEnv } from '../env';

// Set by the server from the connection itself before better-auth runs, never taken from the client.
export const clientAddressHeader = 'x-spanrelay-client-address';

export function createAuth(db: Database, env: ServerEnv) {
  const throttle = createSignInThrottle();
  const signInKeys = (ctx: { body?: unknown; headers?: Headers }) => ({
    email: String((ctx.body as { email?: unknown } | undefined)?.email ?? '').trim().toLowerCase(),
    address: ctx.headers?.get(clientAddressHeader) ?? 'unknown',
  });
  return betterAuth({
    appName: 'Spanrelay',
    baseURL: env.PUBLIC_URL,
    basePath: '/api/auth',
    secret: env.BETTER_AUTH_SECRET,
    trustedOrigins: [env.PUBLIC_URL],
    database: drizzleAdapter(db, { provider: 'pg', usePlural: true, schema }),
    emailAndPassword: { enabled: true, disableSignUp: true, minPasswordLength: 10 },
    user: {
      additionalFields: {
        role: { type: 'string', required: true, input: false, defaultValue: 'contractor' },
        organization: { type: 'string', required: false, input: false },
      },
    },
    session: { expiresIn: 60 * 60 * 24 * 7, updateAge: 60 * 60 * 24 },
    advanced: { database: { generateId: () => crypto.randomUUID() } },
    telemetry: { enabled: false },
    hooks: {
      before: createAuthMiddleware(async (ctx) => {
        if (ctx.path !== '/sign-in/email') return;
        const { email, address } = signInKeys(ctx);
        const waitMs = throttle.retryAfterMs(email, address);
        if (waitMs > 0) {
          throw new APIError('TOO_MANY_REQUESTS', { message: `Too many failed sign-ins. Try again in ${Math.ceil(waitMs / 60000)} minutes, or ask an administrator to reset the password.` });
        }
      }),
      after: createAuthMiddleware(async (ctx) => {
        if (ctx.path !== '/sign-in/email') return;
        const { email, address } = signInKeys(ctx);
        if (ctx.context.returned instanceof APIError) throttle.recordFailure(email, address);
        else throttle.recordSuccess(email);
      }),
    },
  });
}

export type Auth = ReturnType<typeof createAuth>;
