// Browser-facing protections: headers, cookie attributes, cross-site writes, sign-out.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, createScenario, signIn, testPassword, type TestApp } from '../support/apiHarness';

function sessionCookie(header: string | string[] | undefined): string | undefined {
  return [header ?? []].flat().find((c) => c.includes('session_token'));
}

describe('sessions and browser protections', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
  });
  afterAll(() => t.close());

  it('sends security headers, with a content policy that allows only our own origin', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
    expect(res.headers['x-powered-by']).toBeUndefined();
    // No CORS grant: another site's page cannot read our answers.
    const cross = await request(t.app).get('/api/health').set('origin', 'https://elsewhere.example');
    expect(cross.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('keeps the session cookie out of scripts and off cross-site requests', async () => {
    const res = await request(t.app).post('/api/auth/sign-in/email').set('origin', t.env.PUBLIC_URL).send({ email: s.contractor.email, password: testPassword });
    const cookie = sessionCookie(res.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('marks the cookie Secure when served over HTTPS', async () => {
    const https = buildTestApp({ NODE_ENV: 'production', PUBLIC_URL: 'https://spanrelay.example' });
    try {
      const res = await request(https.app).post('/api/auth/sign-in/email').set('origin', 'https://spanrelay.example').send({ email: s.contractor.email, password: testPassword });
      const cookie = sessionCookie(res.headers['set-cookie']);
      expect(cookie).toMatch(/Secure/);
    } finally {
      await https.close();
    }
  });

  it('refuses writes from another site, on our routes and on sign-in', async () => {
    const agent = await signIn(t, s.contractor.email);
    const ours = await agent.post('/api/requests').set('origin', 'https://elsewhere.example').send({ type: 'other_deviation', projectId: s.project.id });
    expect(ours.status).toBe(403);
    expect(ours.body.error.code).toBe('foreign_origin');
    const theirs = await request(t.app).post('/api/auth/sign-in/email').set('origin', 'https://elsewhere.example').send({ email: s.contractor.email, password: testPassword });
    expect(theirs.status).toBe(403);
  });

  it('ends the session on the server at sign-out, so the old cookie no longer works', async () => {
    const agent = await signIn(t, s.contractor.email);
    expect((await agent.get('/api/me')).status).toBe(200);
    const res = await agent.post('/api/auth/sign-in/email').set('origin', t.env.PUBLIC_URL).send({ email: s.contractor.email, password: testPassword });
    const cookie = sessionCookie(res.headers['set-cookie'])!.split(';')[0]!;
    expect((await request(t.app).get('/api/me').set('cookie', cookie)).status).toBe(200);
    expect((await request(t.app).post('/api/auth/sign-out').set('origin', t.env.PUBLIC_URL).set('cookie', cookie)).status).toBe(200);
    expect((await request(t.app).get('/api/me').set('cookie', cookie)).status).toBe(401);
  });

  it('limits failed sign-ins per account, and lets the right password through only after the wait', async () => {
    const fresh = buildTestApp();
    try {
      const attempt = (email: string, password: string) =>
        request(fresh.app).post('/api/auth/sign-in/email').set('origin', fresh.env.PUBLIC_URL).send({ email, password });
      for (let i = 0; i < 5; i++) expect((await attempt(s.fieldInspector.email, 'wrong-password-1')).status).toBe(401);
      const locked = await attempt(s.fieldInspector.email, testPassword);
      expect(locked.status).toBe(429);
      expect(locked.body.message).toMatch(/Too many failed sign-ins/);
      // Another account from the same address is not held back by this one's failures.
      expect((await attempt(s.sectionEngineer.email, testPassword)).status).toBe(200);
    } finally {
      await fresh.close();
    }
  });

  it('limits failed sign-ins per address, across accounts', async () => {
    const fresh = buildTestApp();
    try {
      const attempt = (email: string) =>
        request(fresh.app).post('/api/auth/sign-in/email').set('origin', fresh.env.PUBLIC_URL).send({ email, password: 'wrong-password-2' });
      for (let i = 0; i < 30; i++) expect((await attempt(`guess-${i}@test.spanrelay.test`)).status).toBe(401);
      expect((await attempt('guess-31@test.spanrelay.test')).status).toBe(429);
    } finally {
      await fresh.close();
    }
  });
});
