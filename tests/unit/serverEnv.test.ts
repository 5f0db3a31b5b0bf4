import { describe, expect, it } from 'vitest';
import { readServerEnv } from '../../server/env';

describe('server settings', () => {
  it('stops with the name of every missing setting', () => {
    expect(() => readServerEnv({})).toThrow(/DATABASE_URL[\s\S]*BETTER_AUTH_SECRET[\s\S]*S3_ENDPOINT/);
  });

  it('defaults the port to 8081', () => {
    const env = readServerEnv({
      DATABASE_URL: 'postgres://u@127.0.0.1:5432/db',
      BETTER_AUTH_SECRET: 'x'.repeat(32),
      S3_ENDPOINT: 'http://127.0.0.1:4569',
      S3_BUCKET: 'files',
      SMTP_PORT: '2525',
    });
    expect(env.PORT).toBe(8081);
  });
});
