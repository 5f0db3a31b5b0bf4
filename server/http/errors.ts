// One error shape for every API answer: { error: { code, message, fields? } }.
import type { ErrorRequestHandler } from 'express';
import { MulterError } from 'multer';
import type { ZodError } from 'zod';
import { DatabaseUnreachable } from '../../db/client';

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export function validationError(error: ZodError, message = 'Some fields need attention.'): HttpError {
  // A Map, not an object literal: a sender's key "__proto__" must be named like any other, and
  // assigning it on a plain object would set the prototype and leave the field list empty.
  const fields = new Map<string, string>();
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) fields.set(key, 'This field is not accepted here.');
    } else {
      const key = issue.path.join('.') || '_';
      if (!fields.has(key)) fields.set(key, issue.message);
    }
  }
  return new HttpError(400, 'invalid_input', message, Object.fromEntries(fields));
}

const multerMessages: Record<string, [number, string]> = {
  LIMIT_FILE_SIZE: [413, 'A file is larger than the upload limit.'],
  LIMIT_FILE_COUNT: [413, 'Too many files in one request.'],
  LIMIT_PART_COUNT: [413, 'Too many parts in one upload.'],
  LIMIT_FIELD_KEY: [400, 'A field name is too long.'],
  LIMIT_FIELD_VALUE: [413, 'A field value is too long.'],
  LIMIT_FIELD_COUNT: [400, 'Too many fields.'],
  LIMIT_UNEXPECTED_FILE: [400, 'Files must be sent in the "files" field.'],
};

// What the multipart parser (busboy, under multer) says of an upload body it cannot read: the
// sender's fault, so a 400, not ours.
const unreadableUpload = /^(Malformed part header|Malformed content type|Malformed urlencoded form|Unexpected end of (form|file)|Multipart: Boundary not found|Missing Content-Type|Unsupported content type)/;

// A lost or refused database connection (a restart, a failover, a full pool), however deeply the
// query builder or the auth library wrapped it: the person is told to try again shortly rather
// than that something is broken. Class 08 is connection exceptions; 57P01-03 are shutdown/start-up.
const unavailableCodes = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', '57P01', '57P02', '57P03']);
const unavailableMessages = /Connection terminated|not queryable|timeout exceeded when trying to connect/;

export function isDatabaseUnavailable(err: unknown): boolean {
  // Only below a failed query (or a PostgreSQL message itself), so the store or the mail server
  // refusing a connection is never reported as the database.
  let viaDatabase = false;
  for (let e = err, depth = 0; e && typeof e === 'object' && depth < 6; e = (e as { cause?: unknown }).cause, depth++) {
    if (e instanceof DatabaseUnreachable) return true;
    viaDatabase ||= e.constructor?.name === 'DrizzleQueryError' || 'severity' in e;
    if (!viaDatabase) continue;
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && (unavailableCodes.has(code) || /^08[0-9A-Z]{3}$/.test(code))) return true;
    if (e instanceof Error && unavailableMessages.test(e.message)) return true;
  }
  return false;
}

export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  if (res.headersSent) return;
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: { code: err.code, message: err.message, fields: err.fields } });
    return;
  }
  if (err instanceof MulterError) {
    const [status, message] = multerMessages[err.code] ?? [400, 'The upload could not be read.'];
    res.status(status).json({ error: { code: err.code.toLowerCase(), message } });
    return;
  }
  if (err && typeof err === 'object' && 'type' in err && err.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'malformed_body', message: 'The request body is not valid JSON.' } });
    return;
  }
  if (err && typeof err === 'object' && 'type' in err && err.type === 'entity.too.large') {
    res.status(413).json({ error: { code: 'body_too_large', message: 'The request body is too large.' } });
    return;
  }
  if (err instanceof Error && !(err as { type?: unknown }).type && unreadableUpload.test(err.message)) {
    res.status(400).json({ error: { code: 'malformed_upload', message: 'The upload could not be read; send the files again as multipart/form-data.' } });
    return;
  }
  if (isDatabaseUnavailable(err)) {
    console.error('[spanrelay] database unavailable:', err instanceof Error ? err.message.split('\n')[0] : err);
    res.status(503).json({
      error: { code: 'database_unavailable', message: 'The database is not reachable right now. Try again in a moment; if you were saving a change, reload first to see whether it was kept.' },
    });
    return;
  }
  console.error('[spanrelay] unexpected error', err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side. Try again; if it keeps happening, tell your administrator.' } });
};
