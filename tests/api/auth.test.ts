import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, createScenario, signIn, testPassword, type TestApp } from '../support/apiHarness';

describe('sign-in and roles', () => {
  let t: TestApp;
  let scenario: Awaited<ReturnType<typeof createScenario>>;
  beforeAll(async () => {
    t = buildTestApp();
    scenario = await createScenario(t.db);
  });
  afterAll(() => t.close());

  it('refuses every API route but health to a signed-out caller with 401', async () => {
    for (const path of ['/api/me', '/api/projects', '/api/requests']) {
      const res = await request(t.app).get(path);
      expect(res.status, path).toBe(401);
      expect(res.body.error.code).toBe('signed_out');
    }
  });

  it('signs in with e-mail and password and reports the role kept on the account', async () => {
    const agent = await signIn(t, scenario.sectionEngineer.email);
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ email: scenario.sectionEngineer.email, role: 'section_engineer' });
  });

  it('refuses a wrong password', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in/email')
      .set('origin', t.env.PUBLIC_URL)
      .send({ email: scenario.contractor.email, password: `${testPassword}x` });
    expect(res.status).toBe(401);
  });

  it('has no public sign-up, so nobody can make an account or pick a role', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-up/email')
      .set('origin', t.env.PUBLIC_URL)
      .send({ email: 'walk-in@test.spanrelay.test', password: 'a-long-password', name: 'Walk In', role: 'engineer_of_record' });
    expect(res.status).toBeGreaterThanOrEqual(400);
    const retry = await request(t.app)
      .post('/api/auth/sign-in/email')
      .set('origin', t.env.PUBLIC_URL)
      .send({ email: 'walk-in@test.spanrelay.test', password: 'a-long-password' });
    expect(retry.status).toBe(401);
  });

  it('lists only the projects the user is a member of', async () => {
    const agent = await signIn(t, scenario.contractor.email);
    const res = await agent.get('/api/projects');
    expect(res.status).toBe(200);
    expect(res.body.map((p: { id: string }) => p.id)).toEqual([scenario.project.id]);
  });

  it('hides the development mail listing in production', async () => {
    const prod = buildTestApp({ NODE_ENV: 'production' });
    try {
      const signedIn = await signIn(prod, scenario.contractor.email);
      const res = await signedIn.get('/api/dev/mail');
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('no_such_route');
    } finally {
      await prod.close();
    }
    const dev = await request(t.app).get('/api/dev/mail');
    expect(dev.status).toBe(200);
  });
});
