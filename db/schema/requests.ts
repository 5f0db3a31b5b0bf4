// Requests, their attachments, their trail and the mail they cause.
import { pgTable, text, timestamp, uuid, integer, bigint, jsonb, bigserial, index, uniqueIndex } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { projects } from './projects';
import { roles } from '../../shared/roles';

export const changeRequests = pgTable(
  'change_requests',
  {
    id: uuid('id').primaryKey(),
    number: text('number').notNull().unique(),
    projectId: uuid('project_id').notNull().references(() => projects.id),
    title: text('title').notNull(),
    reason: text('reason').notNull(),
    state: text('state').notNull(),
    // Optimistic-concurrency counter: every accepted move increments it.
    version: integer('version').notNull().default(1),
    filedById: text('filed_by_id').notNull().references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('change_requests_project_idx').on(t.projectId), index('change_requests_state_idx').on(t.state)],
);

export const attachments = pgTable(
  'attachments',
  {
    id: uuid('id').primaryKey(),
    requestId: uuid('request_id').notNull().references(() => changeRequests.id),
    objectKey: text('object_key').notNull().unique(),
    // The uploader's file name, kept for display only; never part of a storage path.
    fileName: text('file_name').notNull(),
    contentType: text('content_type').notNull(),
    sizeBytes: bigint('size_bytes', { mode: 'number' }).notNull(),
    sha256: text('sha256').notNull(),
    uploadedById: text('uploaded_by_id').notNull().references(() => users.id),
    uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('attachments_request_idx').on(t.requestId)],
);

export const trailEvents = pgTable(
  'trail_events',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    requestId: uuid('request_id').notNull().references(() => changeRequests.id),
    seq: integer('seq').notNull(),
    eventType: text('event_type').notNull(),
    stateBefore: text('state_before'),
    stateAfter: text('state_after').notNull(),
    actorId: text('actor_id').notNull().references(() => users.id),
    // The role the actor held when acting: roles can change later, the trail must not.
    actorRole: text('actor_role', { enum: roles }).notNull(),
    comment: text('comment'),
    payload: jsonb('payload').notNull().default({}),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('trail_events_request_seq_idx').on(t.requestId, t.seq)],
);

// Mail is written in the same transaction as the move that causes it and sent afterwards,
// so a move is never lost to a mail failure and no mail goes out for a move that rolled back.
export const mailOutbox = pgTable(
  'mail_outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    body: text('body').notNull(),
    requestId: uuid('request_id').references(() => changeRequests.id),
    status: text('status', { enum: ['pending', 'sent', 'failed'] }).notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }).notNull().defaultNow(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
  },
  (t) => [index('mail_outbox_pending_idx').on(t.status, t.nextAttemptAt)],
);
