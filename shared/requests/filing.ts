// What a contractor must supply to file a request. Used by the form (react-hook-form) and by the
// server, which refuses anything else, including fields it does not know.
import { z } from 'zod';

export const requestFilingFields = z
  .object({
    projectId: z.uuid({ message: 'Choose the project this request is for.' }),
    title: z
      .string({ message: 'Give the request a title.' })
      .trim()
      .min(5, 'The title needs at least 5 characters.')
      .max(160, 'Keep the title under 160 characters.'),
    reason: z
      .string({ message: 'Explain why the departure from the plans is needed.' })
      .trim()
      .min(10, 'Explain the reason in at least 10 characters.')
      .max(8000, 'Keep the reason under 8000 characters; attach longer documents.'),
  })
  .strict();

export type RequestFilingFields = z.infer<typeof requestFilingFields>;

// Per-file and per-request upload limits, shared so the form can warn before sending.
export const uploadLimits = {
  maxFileBytes: 25 * 1024 * 1024,
  maxFilesPerRequest: 10,
} as const;
