// Forgot and reset password through better-auth: the same answer for any address, the link caught
// by the SMTP catcher, the new password working and the old one and its sessions not.
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { upsertAccount } from '../../server/people/accountRepository';
import { buildTestApp, signIn, testPassword, waitForMail, type TestApp } from '../support/apiHarness';

const tokenIn = (text: string, publicUrl: string) => {
  const match = text.match(new RegExp(`${publicUrl.replace(/[.:/]/g, '\\$&')}/reset-password\\?token=([A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`no reset link in: ${text}`);
  return match[1]!;
};

describe('forgotten password', () => {
  let t: TestApp;
  const tag = randomUUID().slice(0, 8);
  const email = `rhea.tolland-${tag}@test.spanrelay.test`;
  const origin = () => ({ origin: t.env.PUBLIC_URL });
  const forgot = (address: string) => request(t.app).post('/api/auth/request-password-reset').set(origin()).send({ email: address });
  const reset = (token: string, newPassword: string) => request(t.app).post('/api/auth/reset-password').set(origin()).send({ token, newPassword });
  const signInWith = (password: string) => request(t.app).post('/api/auth/sign-in/email').set(origin()).send({ email, password });

  beforeAll(async () => {
    t = buildTestApp();
    await upsertAccount(t.db, { email, name: 'Rhea Tolland', role: 'section_engineer', organization: 'Tallis Section', password: testPassword });
  });
  afterAll(() => t.close());

  it('answers the same for an unknown address and sends it nothing', async () => {
    const unknown = `nobody-${tag}@test.spanrelay.test`;
    const res = await forgot(unknown);
    const known = await forgot(email);
    expect(res.status).toBe(200);
    expect(known.status).toBe(200);
    expect(res.body).toEqual(known.body);
    await sleep(500);
    expect(await waitForMail(t.env, unknown, 300)).toEqual([]);
  });

  it('mails a link to our own reset screen; the new password works and the old one and its sessions stop', async () => {
    const oldSession = await signIn(t, email);
    expect((await oldSession.get('/api/me')).status).toBe(200);

    await forgot(email);
    const mails = await waitForMail(t.env, email);
    expect(mails[0]?.subject).toBe('Reset your Spanrelay password');
    const token = tokenIn(mails.at(-1)!.text, t.env.PUBLIC_URL);

    const tooShort = await reset(token, 'short');
    expect(tooShort.status).toBe(400);
    const nameInIt = await reset(token, `new-rhea.tolland-${tag}-pw`);
    expect(nameInIt.status).toBe(400);
    expect(nameInIt.body.message).toMatch(/name part of your e-mail/);

    const done = await reset(token, 'girder splice plate 4');
    expect(done.status).toBe(200);
    expect((await signInWith('girder splice plate 4')).status).toBe(200);
    expect((await signInWith(testPassword)).status).toBe(401);
    expect((await oldSession.get('/api/me')).status).toBe(401);

    // The link is spent.
    const reused = await reset(token, 'another long password');
    expect(reused.status).toBe(400);
    expect((await signInWith('another long password')).status).toBe(401);
  });

  it('refuses a made-up token', async () => {
    const res = await reset('not-a-token-we-sent', 'bearing pad 2 north');
    expect(res.status).toBe(400);
  });
});
