// The few seconds a checked session is remembered (server/auth/sessionCache.ts): a remembered
// session costs no query, yet sign-out, a role change and an account change take effect on the
// very next request, a tampered cookie is never answered from memory, and a remembered session
// stops at its own expiry. Then the cache's own rules with a clock of our own.
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sessions } from '../../db/schema';
import { createSessionCache, forgetAllSessions, sessionCacheMs, type FoundSession } from '../../server/auth/sessionCache';
import { upsertAccount } from '../../server/people/accountRepository';
import { buildTestApp, createScenario, signIn, testPassword, type TestApp } from '../support/apiHarness';
import { withStatementCount } from '../support/statementCounter';

type Scenario = Awaited<ReturnType<typeof createScenario>>;

describe('remembered sessions in the app', () => {
  let t: TestApp;
  let s: Scenario;
  const origin = () => ({ origin: t.env.PUBLIC_URL });

  // A fresh session's cookie (name=value), taken from the sign-in answer.
  async function sessionCookie(email: string): Promise<string> {
    const res = await request(t.app).post('/api/auth/sign-in/email').set(origin()).send({ email, password: testPassword });
    expect(res.status).toBe(200);
    const cookie = [res.headers['set-cookie'] ?? []].flat().find((c: string) => c.includes('session_token'));
    return cookie!.split(';')[0]!;
  }
  const me = (cookie: string) => request(t.app).get('/api/me').set('cookie', cookie);
  async function countedMe(cookie: string) {
    const { result: res, statements } = await withStatementCount(() => me(cookie));
    return { status: res.status, body: res.body as Record<string, unknown>, queries: statements };
  }

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
  });
  afterAll(() => t.close());

  it('checks a session with the database once, then answers it from memory without a query', async () => {
    const cookie = await sessionCookie(s.contractor.email);
    forgetAllSessions();
    const cold = await countedMe(cookie);
    expect(cold.status).toBe(200);
    expect(cold.queries).toBeGreaterThanOrEqual(1);
    const warm = await countedMe(cookie);
    expect(warm).toMatchObject({ status: 200, queries: 0 });
    expect(warm.body).toEqual(cold.body);
  });

  it('never answers a cookie with a forged signature from memory', async () => {
    const cookie = await sessionCookie(s.contractor.email);
    expect((await me(cookie)).status).toBe(200);
    const [name, value] = cookie.split('=') as [string, string];
    const token = decodeURIComponent(value).split('.')[0]!;
    const forged = `${name}=${encodeURIComponent(`${token}.bm90LXRoZS1zaWduYXR1cmU=`)}`;
    expect((await me(forged)).status).toBe(401);
    expect((await me(`${name}=${encodeURIComponent(token)}`)).status).toBe(401);
  });

  it('ends a remembered session at sign-out, on the very next request', async () => {
    const cookie = await sessionCookie(s.sectionEngineer.email);
    expect((await me(cookie)).status).toBe(200);
    expect((await countedMe(cookie)).queries).toBe(0);
    expect((await request(t.app).post('/api/auth/sign-out').set(origin()).set('cookie', cookie)).status).toBe(200);
    expect((await me(cookie)).status).toBe(401);
  });

  it("applies an administrator's demotion to a remembered session on its very next request", async () => {
    const person = s.outsiders.admin;
    const cookie = await sessionCookie(person.email);
    const people = () => request(t.app).get('/api/admin/people').set('cookie', cookie);
    expect((await people()).status).toBe(200);
    expect(await countedMe(cookie)).toMatchObject({ queries: 0, body: { role: 'admin' } });

    const admin = await signIn(t, s.members.admin.email);
    const changed = await admin.patch(`/api/admin/people/${person.id}`).set(origin()).send({ role: 'contractor' });
    expect(changed.status).toBe(200);
    expect((await people()).status).toBe(403);
    expect((await me(cookie)).body.role).toBe('contractor');
  });

  it('shows an account brought up to date (name and role) on the very next request', async () => {
    const person = s.outsiders.auditor;
    const cookie = await sessionCookie(person.email);
    expect((await me(cookie)).body).toMatchObject({ name: person.name, role: 'auditor' });
    expect((await countedMe(cookie)).queries).toBe(0);
    await upsertAccount(t.db, { email: person.email, name: `${person.name} Renamed`, role: 'section_engineer', organization: null, password: testPassword });
    expect((await me(cookie)).body).toMatchObject({ name: `${person.name} Renamed`, role: 'section_engineer', organization: null });
  });

  it('stops answering a remembered session at the session’s own expiry, well before its few seconds are up', async () => {
    expect(sessionCacheMs).toBeGreaterThan(3000);
    // A session signed in without "remember me" is never extended on use (a remembered one is
    // pushed a week ahead whenever it is read), so an expiry set here is the one that holds.
    const res = await request(t.app).post('/api/auth/sign-in/email').set(origin()).send({ email: s.fieldInspector.email, password: testPassword, rememberMe: false });
    expect(res.status).toBe(200);
    const cookies = [res.headers['set-cookie'] ?? []].flat().map((c: string) => c.split(';')[0]!);
    const session = cookies.find((c) => c.includes('session_token'))!;
    expect(cookies.some((c) => c.includes('dont_remember'))).toBe(true);
    const cookie = cookies.join('; ');
    const token = decodeURIComponent(session.split('=')[1]!).split('.')[0]!;
    const expiresAt = new Date(Date.now() + 2000);
    await t.db.update(sessions).set({ expiresAt }).where(eq(sessions.token, token));
    expect((await me(cookie)).status).toBe(200);
    expect(await countedMe(cookie)).toMatchObject({ status: 200, queries: 0 });
    await sleep(expiresAt.getTime() - Date.now() + 100);
    expect((await me(cookie)).status).toBe(401);
  });
});

describe('the session cache itself', () => {
  const person = (id: string) => ({ id, name: `Person ${id}`, email: `${id}@test.spanrelay.test`, role: 'contractor', organization: null });
  const clock = () => {
    let now = 1_000_000;
    return { now: () => now, advance: (ms: number) => (now += ms) };
  };
  const found = (id: string, expiresAt: number): FoundSession => ({ person: person(id), expiresAt: new Date(expiresAt) });

  it('keeps an answer for its time to live, then asks again', async () => {
    const c = clock();
    const cache = createSessionCache({ ttlMs: 5000, now: c.now });
    let lookups = 0;
    const lookUp = async () => ((lookups += 1), found('a', c.now() + 60_000));
    await cache.resolve('k', lookUp);
    c.advance(4999);
    await cache.resolve('k', lookUp);
    expect(lookups).toBe(1);
    c.advance(1);
    await cache.resolve('k', lookUp);
    expect(lookups).toBe(2);
  });

  it('remembers no answer past the session’s expiry, and none for no session', async () => {
    const c = clock();
    const cache = createSessionCache({ ttlMs: 5000, now: c.now });
    let lookups = 0;
    const expiring = async () => ((lookups += 1), found('a', c.now() + 1000));
    await cache.resolve('k', expiring);
    c.advance(999);
    await cache.resolve('k', expiring);
    expect(lookups).toBe(1);
    c.advance(1);
    await cache.resolve('k', expiring);
    expect(lookups).toBe(2);
    expect(await cache.resolve('gone', async () => null)).toBeNull();
    expect(cache.size()).toBe(1);
  });

  it('shares one lookup among callers arriving while it runs', async () => {
    const cache = createSessionCache();
    let lookups = 0;
    let finish!: (f: FoundSession) => void;
    const lookUp = () => ((lookups += 1), new Promise<FoundSession>((r) => (finish = r)));
    const both = Promise.all([cache.resolve('k', lookUp), cache.resolve('k', lookUp)]);
    finish(found('a', Date.now() + 60_000));
    expect((await both).map((p) => p?.id)).toEqual(['a', 'a']);
    expect(lookups).toBe(1);
  });

  it('does not keep a lookup that was running when the person was forgotten (it may have read the old row)', async () => {
    const cache = createSessionCache();
    let finish!: (f: FoundSession) => void;
    const slow = () => new Promise<FoundSession>((r) => (finish = r));
    const pending = cache.resolve('k', slow);
    cache.forgetPerson('a');
    finish(found('a', Date.now() + 60_000));
    await pending;
    expect(cache.size()).toBe(0);
    // A caller after the forgetting starts a lookup of its own rather than joining the old one.
    let fresh = 0;
    await cache.resolve('k', async () => ((fresh += 1), found('a', Date.now() + 60_000)));
    expect(fresh).toBe(1);
    expect(cache.size()).toBe(1);
  });

  it('forgets only the person named, or everyone', async () => {
    const cache = createSessionCache();
    for (const id of ['a', 'b']) await cache.resolve(`k-${id}`, async () => found(id, Date.now() + 60_000));
    cache.forgetPerson('a');
    expect(cache.size()).toBe(1);
    cache.forgetAll();
    expect(cache.size()).toBe(0);
  });

  it('holds at most its bound, dropping the oldest first', async () => {
    const cache = createSessionCache({ maxEntries: 3 });
    let lookups = 0;
    const lookUp = (id: string) => async () => ((lookups += 1), found(id, Date.now() + 60_000));
    for (const id of ['a', 'b', 'c', 'd']) await cache.resolve(id, lookUp(id));
    expect(cache.size()).toBe(3);
    lookups = 0;
    await cache.resolve('d', lookUp('d'));
    await cache.resolve('b', lookUp('b'));
    expect(lookups).toBe(0);
    await cache.resolve('a', lookUp('a'));
    expect(lookups).toBe(1);
  });
});
