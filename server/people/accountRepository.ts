// Accounts are made here rather than through public sign-up: an administrator (or the demo seed)
// decides who may sign in and at which desk.
import { eq } from 'drizzle-orm';
import { hashPassword } from 'better-auth/crypto';
import { randomUUID } from 'node:crypto';
import type { Database, Transaction } from '../../db/client';
import { accounts, users } from '../../db/schema';
import type { Role } from '../../shared/roles';
import { forgetSessionsOf } from '../auth/sessionCache';

export type NewAccount = { email: string; name: string; role: Role; organization: string | null; password: string };

// Creates the user with an email-and-password credential, or brings an existing one up to date.
export async function upsertAccount(db: Database, input: NewAccount): Promise<string> {
  const email = input.email.toLowerCase();
  const passwordHash = await hashPassword(input.password);
  const userId = await db.transaction(async (tx) => {
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, email));
    if (!existing) return insertAccount(tx, { ...input, email }, passwordHash);
    await tx.update(users).set({ name: input.name, role: input.role, organization: input.organization, updatedAt: new Date() }).where(eq(users.id, existing.id));
    await tx.update(accounts).set({ password: passwordHash, updatedAt: new Date() }).where(eq(accounts.userId, existing.id));
    return existing.id;
  });
  // After commit: a session lookup between the forgetting and the commit would read the old row.
  forgetSessionsOf(userId);
  return userId;
}

// A new account inside the caller's transaction (an accepted invitation); the unique e-mail
// refuses a second account for one address even if two acceptances race.
export async function createAccount(tx: Transaction, input: NewAccount): Promise<string> {
  return insertAccount(tx, { ...input, email: input.email.toLowerCase() }, await hashPassword(input.password));
}

export async function accountIdByEmail(db: Database | Transaction, email: string): Promise<string | null> {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, email.toLowerCase()));
  return row?.id ?? null;
}

async function insertAccount(tx: Transaction, input: NewAccount, passwordHash: string): Promise<string> {
  const userId = randomUUID();
  await tx.insert(users).values({ id: userId, email: input.email, name: input.name, role: input.role, organization: input.organization, emailVerified: true });
  await tx.insert(accounts).values({ id: randomUUID(), userId, accountId: userId, providerId: 'credential', password: passwordHash });
  return userId;
}
