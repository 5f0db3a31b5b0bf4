// Invitations an administrator sends. Only the token's SHA-256 is kept, so the table alone cannot be
// used to accept one; a row is spent (accepted_at) rather than deleted, so the link stays single-use.
import { pgTable, text, timestamp, uuid, jsonb, index, uniqueIndex } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { users } from './auth';
import { roles } from '../../shared/roles';

export const invitations = pgTable(
  'invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    // Kept lower-cased, as accounts are.
    email: text('email').notNull(),
    name: text('name').notNull(),
    role: text('role', { enum: roles }).notNull(),
    organization: text('organization'),
    // Projects the new account joins on acceptance; ids of projects gone by then are skipped.
    projectIds: jsonb('project_ids').$type<string[]>().notNull().default([]),
    tokenHash: text('token_hash').notNull().unique(),
    invitedById: text('invited_by_id').notNull().references(() => users.id),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    acceptedUserId: text('accepted_user_id').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    // One open invitation per address: inviting again replaces it.
    uniqueIndex('invitations_open_email_idx').on(t.email).where(sql`${t.acceptedAt} is null`),
    index('invitations_created_idx').on(t.createdAt),
  ],
);
