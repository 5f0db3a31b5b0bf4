// better-auth, built once per app. Accounts are made by an administrator (or the demo seed), so
// public sign-up is off; `role` is stored on the user and can never be set by the user.
import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import type { Database } from '../../db/client';
import * as schema from '../../db/schema';
import type { ServerEnv } from '../env';

export function createAuth(db: Database, env: ServerEnv) {
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
  });
}

export type Auth = ReturnType<typeof createAuth>;
