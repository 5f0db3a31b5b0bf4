// Requests, their revisions, conditions, attachments, trail and the mail they cause.
import { sql } from 'drizzle-orm';
import { pgTable, text, timestamp, uuid, integer, bigint, jsonb, bigserial, boolean, index, uniqueIndex, primaryKey } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { projects } from './projects';
import { roles } from '../../shared/roles';

export const changeRequests = pgTable(
  'change_requests',
  {
    id: uuid('id').primaryKey(),
    number: text('number').notNull().unique(),
    projectId: uuid('project_id').notNull().references(() => projects.id),
    type: text('type').notNull(),
    // Copied from the current revision so lists and search need no jsonb.
    title: text('title').notNull(),
    state: text('state').notNull(),
    // Optimistic-concurrency counter: every accepted change increments it.
    version: integer('version').notNull().default(1),
    currentRevision: integer('current_revision').notNull().default(1),
    filedById: text('filed_by_id').notNull().references(() => users.id),
    assignedEorId: text('assigned_eor_id').references(() => users.id),
    decision: text('decision', { enum: ['approved', 'approved_with_conditions', 'rejected'] }),
    // null until central office classifies the change on a federal-aid project.
    majorChange: boolean('major_change'),
    federalConcurrenceAttachmentId: uuid('federal_concurrence_attachment_id'),
    // The time of the trail event that put the request on its current desk.
    deskSince: timestamp('desk_since', { withTimezone: true }).notNull().defaultNow(),
    // When the request falls due at that desk ('infinity' once settled), kept by a trigger
    // (drizzle/0004_request_due_at.sql) from the state, desk_since and the project's desk days, so
    // desks sort and count overdue work through an index instead of computing it row by row.
    dueAt: timestamp('due_at', { withTimezone: true }).notNull().default(sql`'infinity'::timestamptz`),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    // A desk is some states on the reader's projects: both columns, so the desk list reads only its
    // own rows (it also serves every lookup by project alone).
    // The due date last, so a desk reads its first page already in order: per project for a reader
    // on a few projects, across all of them for one on most (central office).
    index('change_requests_project_state_due_idx').on(t.projectId, t.state, t.dueAt, t.id),
    index('change_requests_state_due_idx').on(t.state, t.dueAt, t.id),
    index('change_requests_desk_since_idx').on(t.deskSince, t.id),
    // The register's text search (ILIKE '%…%') on title and number, through trigrams (pg_trgm).
    index('change_requests_title_trgm_idx').using('gin', t.title.op('gin_trgm_ops')),
    index('change_requests_number_trgm_idx').using('gin', t.number.op('gin_trgm_ops')),
  ],
);

export const requestRevisions = pgTable(
  'request_revisions',
  {
    requestId: uuid('request_id').notNull().references(() => changeRequests.id),
    revision: integer('revision').notNull(),
    // The typed request body (shared/requests/requestBody.ts), complete once submitted.
    body: jsonb('body').notNull(),
    // Inputs, results and module version of the engineering check computed at submit.
    engineering: jsonb('engineering'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    submittedAt: timestamp('submitted_at', { withTimezone: true }),
  },
  (t) => [primaryKey({ columns: [t.requestId, t.revision] })],
);

export const requestConditions = pgTable(
  'request_conditions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    requestId: uuid('request_id').notNull().references(() => changeRequests.id),
    seq: integer('seq').notNull(),
    text: text('text').notNull(),
    dueBefore: text('due_before').notNull(),
    satisfiedById: text('satisfied_by_id').references(() => users.id),
    satisfiedAt: timestamp('satisfied_at', { withTimezone: true }),
    note: text('note'),
    evidenceAttachmentId: uuid('evidence_attachment_id'),
  },
  (t) => [uniqueIndex('request_conditions_seq_idx').on(t.requestId, t.seq)],
);

export const attachmentPurposes = ['revision', 'information_response', 'federal_concurrence', 'condition_evidence', 'decision_record'] as const;

export const attachments = pgTable(
  'attachments',
  {
    id: uuid('id').primaryKey(),
    requestId: uuid('request_id').notNull().references(() => changeRequests.id),
    revision: integer('revision').notNull(),
    purpose: text('purpose', { enum: attachmentPurposes }).notNull().default('revision'),
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

// Append-only (a trigger refuses UPDATE, DELETE and TRUNCATE); each row's hash chains to the one before.
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
    createdAt: timestamp('created_at', { withTimezone: true }).notNull(),
    prevHash: text('prev_hash').notNull(),
    hash: text('hash').notNull(),
  },
  (t) => [uniqueIndex('trail_events_request_seq_idx').on(t.requestId, t.seq)],
);

// One row per message: the record of what was sent, to whom, for which event. The delivery job
// (graphile-worker) is queued in the same transaction and refers to this row by id.
export const mailOutbox = pgTable(
  'mail_outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    // One message per event and recipient, whatever retries or second workers do.
    idempotencyKey: text('idempotency_key').notNull().unique(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    body: text('body').notNull(),
    requestId: uuid('request_id').references(() => changeRequests.id),
    status: text('status', { enum: ['pending', 'sent'] }).notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
  },
  (t) => [index('mail_outbox_request_idx').on(t.requestId)],
);

// Which overdue reminders went out: one per request, desk visit and overdue period.
export const deskReminders = pgTable(
  'desk_reminders',
  {
    requestId: uuid('request_id').notNull().references(() => changeRequests.id),
    deskSince: timestamp('desk_since', { withTimezone: true }).notNull(),
    period: integer('period').notNull(),
    sentAt: timestamp('sent_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.requestId, t.deskSince, t.period] })],
);
