// The conditions list's query string. Open conditions are the field inspector's work; "all" adds
// the ones met lately, so a person can see what was confirmed and on what evidence.
import { z } from 'zod';

// How far back "recently met" reaches.
export const recentlyMetDays = 30;

export const conditionListQuerySchema = z.strictObject({
  status: z.enum(['open', 'all'], { message: 'Choose open or all.' }).default('open'),
  projectId: z.uuid({ message: 'Unknown project.' }).optional(),
});

export type ConditionListQuery = z.infer<typeof conditionListQuerySchema>;
