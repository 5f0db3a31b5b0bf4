// better-auth, built once per app. Accounts are made by an administrator (or the demo seed), so
// public sign-up is off; `role` is stored on the user and can never be set by the user.
import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { APIError, createAuthMiddleware, getSessionFromCtx } from 'better-auth/api';
import { forgetAllSessions } from './sessionCache';
import { createSignInThrottle } from './signInThrottle';
import type { Database } from '../../db/client';
import * as schema from '../../db/schema';
import { maxPasswordLength, minPasswordLength, passwordProblem } from '../../shared/people/password';
import type { ServerEnv } from '../env';
import { createMailer, type Mailer } from '../mail/mailer';
import { passwordResetMail, resetLink } from '../people/accountMail';

// Set by the server from the connection itself before better-auth runs, never taken from the client.
export const clientAddressHeader = 'x-spanrelay-client-address';

const resetValidSeconds = 60 * 60;

// better-auth calls that neither end a session nor change a person. After any other (sign-out,
// password reset, revoking sessions…) this process forgets every session it remembers, so the
// very next request is checked against the database.
const leavesSessionsAlone = new Set(['/sign-in/email', '/get-session', '/request-password-reset', '/ok', '/error']);

// Without a mailer of the process's own, each reset opens and closes its own SMTP connection.
function oneOffMailer(env: ServerEnv): Mailer {
  return {
    async send(mail) {
      const mailer = createMailer(env);
      try {
        await mailer.send(mail);
      } finally {
        mailer.close();
      }
    },
    isUp: async () => true,
    close: () => {},
  };
}

export function createAuth(db: Database, env: ServerEnv, mailer: Mailer = oneOffMailer(env)) {
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
    emailAndPassword: {
      enabled: true,
      disableSignUp: true,
      minPasswordLength,
      maxPasswordLength,
      resetPasswordTokenExpiresIn: resetValidSeconds,
      // Whoever held the old password is signed out everywhere by the reset.
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, token }) => {
        // Not awaited: the answer must take as long for an unknown address as for a known one.
        const mail = passwordResetMail({ to: user.email, name: user.name, link: resetLink(env.PUBLIC_URL, token), validMinutes: resetValidSeconds / 60 });
        void mailer.send(mail).catch((err: unknown) => console.error('[spanrelay] password reset mail not sent:', err instanceof Error ? err.message : err));
      },
      onPasswordReset: async ({ user }) => {
        throttle.recordSuccess(user.email.toLowerCase());
      },
    },
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
        if (ctx.path === '/reset-password') return refuseWeakReset(ctx);
        if (ctx.path === '/update-user') return refuseSelfProfileChange(ctx);
        if (ctx.path !== '/sign-in/email') return;
        const { email, address } = signInKeys(ctx);
        const waitMs = throttle.retryAfterMs(email, address);
        if (waitMs > 0) {
          throw new APIError('TOO_MANY_REQUESTS', { message: `Too many failed sign-ins. Try again in ${Math.ceil(waitMs / 60000)} minutes, or choose “Forgot your password?” to reset it.` });
        }
      }),
      after: createAuthMiddleware(async (ctx) => {
        // Runs once the call's own writes are done and before its answer is sent.
        if (!leavesSessionsAlone.has(ctx.path)) forgetAllSessions();
        if (ctx.path !== '/sign-in/email') return;
        const { email, address } = signInKeys(ctx);
        if (ctx.context.returned instanceof APIError) throttle.recordFailure(email, address);
        else throttle.recordSuccess(email);
      }),
    },
  });
}

// The same rule an invited person meets: the new password may not contain the address's name part.
// Only a live token reaches the check; anything else is left to better-auth's own answer.
async function refuseWeakReset(ctx: Parameters<Parameters<typeof createAuthMiddleware>[0]>[0]) {
  const body = (ctx.body ?? {}) as { token?: unknown; newPassword?: unknown };
  if (typeof body.token !== 'string' || typeof body.newPassword !== 'string') return;
  const verification = await ctx.context.internalAdapter.findVerificationValue(`reset-password:${body.token}`);
  if (!verification || verification.expiresAt < new Date()) return;
  const user = await ctx.context.internalAdapter.findUserById(verification.value);
  const problem = user ? passwordProblem(body.newPassword, user.email) : null;
  if (problem) throw new APIError('BAD_REQUEST', { message: problem, code: 'WEAK_PASSWORD' });
}

// A person's name is what the trail shows beside every move they made, so nobody renames
// themself: the name is chosen once, on accepting the invitation. Signed out stays a 401.
async function refuseSelfProfileChange(ctx: Parameters<Parameters<typeof createAuthMiddleware>[0]>[0]) {
  const session = await getSessionFromCtx(ctx);
  if (!session) throw new APIError('UNAUTHORIZED', { message: 'Sign in to continue.' });
  throw new APIError('FORBIDDEN', { message: 'Your name and role are kept by an administrator; ask one to change them.', code: 'PROFILE_LOCKED' });
}

export type Auth = ReturnType<typeof createAuth>;
