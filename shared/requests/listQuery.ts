// The register's query string: filters, text search and the page cursor.
import { z } from 'zod';
import { requestTypes } from './requestBody';
import { requestStates } from './states';

export const requestListQuerySchema = z.strictObject({
  desk: z.enum(['mine', 'all']).optional(),
  state: z.enum(requestStates, { message: 'Unknown state.' }).optional(),
  type: z.enum(requestTypes, { message: 'Unknown request type.' }).optional(),
  projectId: z.uuid({ message: 'Unknown project.' }).optional(),
  q: z.string().trim().min(1).max(200).optional(),
  cursor: z.string().max(500).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(25),
});

export type RequestListQuery = z.infer<typeof requestListQuerySchema>;
