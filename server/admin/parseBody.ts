// Reads a JSON body with one of the shared schemas; a failure names each field in our error shape.
import type { z } from 'zod';
import { HttpError, validationError } from '../http/errors';

export function parseBody<S extends z.ZodType>(schema: S, body: unknown, message: string): z.infer<S> {
  if (body === undefined || body === null) throw new HttpError(400, 'empty_body', 'The request body is empty.');
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw validationError(parsed.error, message);
  return parsed.data;
}

// Ids in paths are only ever looked up, never trusted; anything odd is simply not found.
export function pathId(value: unknown, what: string): string {
  if (typeof value !== 'string' || value.length === 0 || value.length > 64) throw new HttpError(404, `${what}_not_found`, `No ${what} has that id.`);
  return value;
}
