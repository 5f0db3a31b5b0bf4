// Accounts are made here rather than through public sign-up: an administrator (or the demo seed)
// decides who may sign in and at which desk.
import { eq } from 'drizzle-orm';
import { hashPassword } from 'better-auth/crypto';
import { randomUUID } from 'node:crypto';
import type { Database } from '../../db/client';
import { accounts, users } from '../../db/schema';
import type { Role } from '../../shared/roles';

export type NewAccount = { email: string; name: string; role: Role; organization: string | null; password: string };

// Creates the user with an email-and-password credential, or brings an existing one up to date.
export async function upsertAccount(db: Database, input: NewAccount): Promise<string> {
  const email = input.email.toLowerCase();
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (tx) => {
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, email));
    const userId = existing?.id ?? randomUUID();
    if (existing) {
      await tx.update(users).set({ name: input.name, role: input.role, organization: input.organization, updatedAt: new Date() }).where(eq(users.id, userId));
      await tx.update(accounts).set({ password: passwordHash, updatedAt: new Date() }).where(eq(accounts.userId, userId));
    } else {
      await tx.insert(users).values({ id: userId, email, name: input.name, role: input.role, organization: input.organization, emailVerified: true });
      await tx.insert(accounts).values({ id: randomUUID(), userId, accountId: userId, providerId: 'credential', password: passwordHash });
    }
    return userId;
  });
}
