import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { buildTestApp } from '../support/apiHarness';

describe('GET /api/health', () => {
  const apps: ReturnType<typeof buildTestApp>[] = [];
  const build = (overrides?: Parameters<typeof buildTestApp>[0]) => {
    const t = buildTestApp(overrides);
    apps.push(t);
    return t;
  };
  afterAll(async () => {
    await Promise.all(apps.map((t) => t.close()));
  });

  it('answers ok with every part up when PostgreSQL, S3 and SMTP are reachable', async () => {
    const res = await request(build().app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, db: 'up', s3: 'up', smtp: 'up' });
  });

  it('reports the object store down with 503 when S3 is unreachable', async () => {
    const res = await request(build({ S3_ENDPOINT: 'http://127.0.0.1:9' }).app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ ok: false, db: 'up', s3: 'down', smtp: 'up' });
  });

  it('reports mail down with 503 when SMTP is unreachable', async () => {
    const res = await request(build({ SMTP_PORT: '9' }).app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ ok: false, db: 'up', smtp: 'down' });
  });

  it('reports the database down with 503 when PostgreSQL is unreachable', async () => {
    const res = await request(build({ DATABASE_URL: 'postgres://postgres@127.0.0.1:9/none' }).app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ ok: false, db: 'down' });
  });
});
