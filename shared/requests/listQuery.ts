// The register's query string: filters, text search, sort and the page cursor.
import { z } from 'zod';
import { deskRoles } from '../workflow/desks';
import { requestTypes } from './requestBody';
import { requestStates } from './states';

// `due`: soonest due first, so overdue requests lead; settled ones (no desk) come last.
export const requestSorts = ['due', 'waiting', 'newest', 'updated'] as const;
export type RequestSort = (typeof requestSorts)[number];

export const requestSortLabels: Record<RequestSort, string> = {
  due: 'Due soonest (overdue first)',
  waiting: 'Longest at its desk',
  newest: 'Newest filed',
  updated: 'Latest activity',
};

export const requestFilterSchema = z.strictObject({
  desk: z.enum(['mine', 'all']).optional(),
  // Which desk the request sits at now; `settled` for requests no desk holds any more.
  atDesk: z.enum([...deskRoles, 'settled'], { message: 'Unknown desk.' }).optional(),
  state: z.enum(requestStates, { message: 'Unknown state.' }).optional(),
  type: z.enum(requestTypes, { message: 'Unknown request type.' }).optional(),
  projectId: z.uuid({ message: 'Unknown project.' }).optional(),
  q: z.string().trim().min(1).max(200).optional(),
});

export const requestListQuerySchema = requestFilterSchema.extend({
  sort: z.enum(requestSorts, { message: 'Unknown sort.' }).default('waiting'),
  cursor: z.string().max(500).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(25),
});

export type RequestFilterQuery = z.infer<typeof requestFilterSchema>;
export type RequestListQuery = z.infer<typeof requestListQuerySchema>;

// How many requests the filters match, per state, and how many are past their desk's due date.
export type RequestCounts = { total: number; overdue: number; byState: Partial<Record<(typeof requestStates)[number], number>> };
