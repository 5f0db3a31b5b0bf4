// A project is one structure under one construction contract; membership decides who sees its requests.
import { pgTable, text, timestamp, uuid, integer, primaryKey, index, boolean, jsonb } from 'drizzle-orm/pg-core';
import { defaultDeskDueDays, type DeskDueDays } from '../../shared/workflow/desks';
import { users } from './auth';

export const projects = pgTable('projects', {
  id: uuid('id').primaryKey().defaultRandom(),
  // Short code that prefixes request numbers, e.g. "PC-0114".
  code: text('code').notNull().unique(),
  name: text('name').notNull(),
  structureNumber: text('structure_number').notNull(),
  featureCarried: text('feature_carried').notNull(),
  featureCrossed: text('feature_crossed').notNull(),
  county: text('county').notNull(),
  contractNumber: text('contract_number').notNull(),
  contractorFirm: text('contractor_firm').notNull(),
  section: text('section').notNull(),
  // Federal-aid projects need the oversight agency's concurrence before a major change is decided.
  federalAid: boolean('federal_aid').notNull().default(false),
  // Days a request may wait at each desk before reminders go out.
  deskDueDays: jsonb('desk_due_days').$type<DeskDueDays>().notNull().default(defaultDeskDueDays),
  // Next request sequence; incremented under the row lock of the filing transaction.
  nextRequestSeq: integer('next_request_seq').notNull().default(1),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  // The register's text search looks up projects by name and structure number first (pg_trgm).
  index('projects_name_trgm_idx').using('gin', t.name.op('gin_trgm_ops')),
  index('projects_structure_number_trgm_idx').using('gin', t.structureNumber.op('gin_trgm_ops')),
]);

export const projectMembers = pgTable(
  'project_members',
  {
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    userId: text('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    addedAt: timestamp('added_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.projectId, t.userId] }), index('project_members_user_idx').on(t.userId)],
);
