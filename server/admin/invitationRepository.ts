// Invitation rows. Tokens arrive here already hashed; the clear token never reaches the database.
import { and, desc, eq, isNull } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { invitations, users } from '../../db/schema';
import type { Role } from '../../shared/roles';

export type InvitationRow = typeof invitations.$inferSelect;
export type NewInvitation = {
  email: string;
  name: string;
  role: Role;
  organization: string | null;
  projectIds: string[];
  tokenHash: string;
  invitedById: string;
  expiresAt: Date;
};

export async function openInvitations(db: Database) {
  return db
    .select({ invitation: invitations, invitedBy: users.name })
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.invitedById))
    .where(isNull(invitations.acceptedAt))
    .orderBy(desc(invitations.createdAt));
}

export async function findOpenInvitation(db: Database | Transaction, id: string): Promise<InvitationRow | null> {
  const [row] = await db.select().from(invitations).where(and(eq(invitations.id, id), isNull(invitations.acceptedAt)));
  return row ?? null;
}

// Inviting an address again replaces its open invitation, so only the newest link works.
export async function replaceOpenInvitation(tx: Transaction, input: NewInvitation): Promise<InvitationRow> {
  await tx.delete(invitations).where(and(eq(invitations.email, input.email), isNull(invitations.acceptedAt)));
  const [row] = await tx.insert(invitations).values(input).returning();
  return row!;
}

export async function withdrawInvitation(db: Database, id: string): Promise<boolean> {
  const removed = await db.delete(invitations).where(and(eq(invitations.id, id), isNull(invitations.acceptedAt))).returning({ id: invitations.id });
  return removed.length > 0;
}

// Locked, so two acceptances of one link are served one after the other and the second finds it spent.
export async function lockInvitationByToken(tx: Transaction, tokenHash: string): Promise<InvitationRow | null> {
  const [row] = await tx.select().from(invitations).where(eq(invitations.tokenHash, tokenHash)).for('update');
  return row ?? null;
}

export async function findInvitationByToken(db: Database, tokenHash: string): Promise<InvitationRow | null> {
  const [row] = await db.select().from(invitations).where(eq(invitations.tokenHash, tokenHash));
  return row ?? null;
}

export async function markAccepted(tx: Transaction, id: string, userId: string): Promise<void> {
  await tx.update(invitations).set({ acceptedAt: new Date(), acceptedUserId: userId }).where(eq(invitations.id, id));
}
