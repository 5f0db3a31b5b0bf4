// Configuration read once at start-up; a missing or malformed value stops the server with its name.
import { z } from 'zod';

const port = z.coerce.number().int().min(1).max(65535);

export const serverEnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: port.default(8081),
  PUBLIC_URL: z.url().default('http://127.0.0.1:8081'),
  DATABASE_URL: z.string().startsWith('postgres', 'DATABASE_URL must be a postgres:// URL'),
  BETTER_AUTH_SECRET: z.string().min(32, 'BETTER_AUTH_SECRET needs at least 32 characters'),
  S3_ENDPOINT: z.url(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(3),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: port,
  MAIL_FROM: z.string().default('Spanrelay <no-reply@spanrelay.test>'),
  // Where the development mail catcher lists what it caught; unset in production.
  MAIL_CATCHER_URL: z.url().optional(),
  WEB_DIST: z.string().optional(),
  UPLOAD_MAX_FILE_BYTES: z.coerce.number().int().positive().optional(),
  UPLOAD_MAX_REQUEST_BYTES: z.coerce.number().int().positive().optional(),
});

export type ServerEnv = z.infer<typeof serverEnvSchema>;

export function readServerEnv(source: NodeJS.ProcessEnv = process.env): ServerEnv {
  const parsed = serverEnvSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Spanrelay cannot start; fix these settings:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
