// The administrator invites a field inspector from a phone; the invitee opens the mailed link in a
// browser of their own, chooses a password (a weak one is refused in place) and lands signed in.
// Later they forget it and reset it from the sign-in screen. A contractor typing /people is refused.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoEmail, demoPassword, demoProject } from '../../server/demo/demoScenario';
import { launchChromium } from '../support/browser';
import { artifactsDir } from '../support/testSettings';
import { base, fillFields, screenshotWhole } from './helpers';

const shots = join(artifactsDir(), 'screenshots');
const phone = { width: 390, height: 844 };
const wide = { width: 1440, height: 900 };

type CaughtMail = { to: string[] | string; subject: string; text: string };

async function linkMailed(to: string, subject: string, path: string, notIn: string[] = []): Promise<string> {
  const deadline = Date.now() + 15_000;
  while (Date.now() < deadline) {
    const all = (await (await fetch(`${base}/api/dev/mail`)).json()) as CaughtMail[];
    for (const m of all.filter((m) => m.to.includes(to) && m.subject === subject)) {
      const link = m.text.match(new RegExp(`${base.replace(/[.:/]/g, '\\$&')}${path}\\?token=[A-Za-z0-9_-]+`))?.[0];
      if (link && !notIn.includes(link)) return link;
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no "${subject}" mail with a ${path} link reached ${to}`);
}

// Any script error on a page fails the test, even if the screen happens to look right.
const pageErrors: string[] = [];
async function watched(page: Page): Promise<Page> {
  page.on('pageerror', (e) => pageErrors.push(`${page.url()}: ${e.message}`));
  return page;
}

async function signIn(page: Page, email: string, password: string) {
  await page.goto(`${base}/sign-in`);
  await fillFields(page, { 'sign-in-email': email, 'sign-in-password': password });
  await page.getByTestId('sign-in-submit').click();
}

describe('people: invitation and password reset in the browser', () => {
  let browser: Browser;
  const tag = randomUUID().slice(0, 6);
  const email = `lena.hartwick-${tag}@tallis-section.test`;
  const password = 'pier two bearing seat';

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    browser = await launchChromium();
  });
  afterAll(() => browser?.close());

  it('an administrator invites someone and they accept on their phone', async () => {
    const adminPage = await watched(await browser.newPage({ viewport: phone }));
    await signIn(adminPage, demoEmail('admin'), demoPassword);
    await expect.poll(() => adminPage.getByTestId('shell-actor').textContent()).toContain('Administrator');
    await adminPage.goto(`${base}/people`);
    await adminPage.getByTestId('invite-open').click();
    await fillFields(adminPage, { 'invite-email': email, 'invite-name': 'Lena Hartwick', 'invite-organization': 'Tallis Section' });
    await adminPage.getByTestId('invite-submit').click();
    // A role must be chosen; the form says so beside the choices.
    await expect.poll(() => adminPage.getByTestId('invite-role-error').textContent()).toBe('Choose one of the roles.');
    await adminPage.getByTestId('invite-role-field_inspector').click();
    await adminPage.getByTestId(`invite-project-${demoProject.code}`).click();
    await adminPage.getByTestId('invite-submit').click();
    await expect.poll(() => adminPage.getByTestId('invite-sent').textContent()).toContain(email);
    await expect.poll(() => adminPage.getByTestId(`invitation-${email}`).textContent()).toContain('Field inspector');
    await screenshotWhole(adminPage, phone, join(shots, 'people-admin-phone.png'));

    const link = await linkMailed(email, 'You are invited to Spanrelay', '/accept-invitation');
    const invitee = await watched(await (await browser.newContext({ viewport: phone })).newPage());
    await invitee.goto(link);
    await expect.poll(() => invitee.getByTestId('accept-invitation-details').textContent()).toContain('Field inspector, Tallis Section');
    await fillFields(invitee, { 'accept-password': `my ${email.split('@')[0]} pass`, 'accept-confirm': `my ${email.split('@')[0]} pass` });
    await invitee.getByTestId('accept-submit').click();
    await expect.poll(() => invitee.getByText('must not contain the name part').count()).toBe(1);
    await fillFields(invitee, { 'accept-password': password, 'accept-confirm': password });
    await screenshotWhole(invitee, phone, join(shots, 'accept-invitation-phone.png'));
    await invitee.getByTestId('accept-submit').click();
    await expect.poll(() => invitee.getByTestId('shell-actor').textContent(), { timeout: 15_000 }).toContain('Lena Hartwick');
    expect(await invitee.getByTestId('shell-actor').textContent()).toContain('Field inspector');

    // Spent: the same link now says so.
    await invitee.goto(link);
    await expect.poll(() => invitee.getByTestId('accept-invalid').textContent()).toContain('already been used');

    await adminPage.reload();
    await expect.poll(() => adminPage.getByTestId(`person-${email}`).textContent()).toContain(demoProject.code);
    expect(await adminPage.getByTestId(`invitation-${email}`).count()).toBe(0);

    // The administrator moves the new person to the auditor's desk; they see it on their next step.
    await adminPage.getByTestId(`person-edit-${email}`).click();
    await adminPage.getByTestId('person-role-auditor').click();
    await adminPage.getByTestId('person-save').click();
    await expect.poll(() => adminPage.getByTestId(`person-role-of-${email}`).textContent()).toBe('Auditor · Tallis Section');
    await invitee.goto(`${base}/`);
    await expect.poll(() => invitee.getByTestId('shell-actor').textContent()).toContain('Auditor');

    await adminPage.getByTestId('admin-tab-projects').click();
    await expect.poll(() => adminPage.getByTestId(`project-${demoProject.code}-members`).textContent()).toContain('Lena Hartwick');
    await screenshotWhole(adminPage, phone, join(shots, 'people-projects-phone.png'));
    await adminPage.setViewportSize(wide);
    await screenshotWhole(adminPage, wide, join(shots, 'people-projects-wide.png'));
    await adminPage.getByTestId('admin-tab-people').click();
    await expect.poll(() => adminPage.getByTestId(`person-${email}`).count()).toBe(1);
    await screenshotWhole(adminPage, wide, join(shots, 'people-admin-wide.png'));
  });

  it('the new person resets a forgotten password from the sign-in screen', async () => {
    const page = await watched(await (await browser.newContext({ viewport: wide })).newPage());
    await page.goto(`${base}/sign-in`);
    await page.getByTestId('sign-in-forgot').click();
    await page.waitForURL(/\/forgot-password/);
    await fillFields(page, { 'forgot-email': email });
    await page.getByTestId('forgot-submit').click();
    await expect.poll(() => page.getByTestId('forgot-sent').textContent()).toContain(email);

    const link = await linkMailed(email, 'Reset your Spanrelay password', '/reset-password');
    await page.goto(link);
    await fillFields(page, { 'reset-password': 'girder haunch five', 'reset-confirm': 'girder haunch fiv' });
    await page.getByTestId('reset-submit').click();
    await expect.poll(() => page.getByText('The two passwords differ.').count()).toBe(1);
    await fillFields(page, { 'reset-confirm': 'girder haunch five' });
    await page.getByTestId('reset-submit').click();
    await expect.poll(() => page.getByTestId('reset-done').textContent()).toContain('new password is set');
    await screenshotWhole(page, wide, join(shots, 'reset-password-wide.png'));

    await signIn(page, email, password);
    await expect.poll(() => page.getByText('That e-mail and password do not match an account.').count()).toBe(1);
    await signIn(page, email, 'girder haunch five');
    await expect.poll(() => page.getByTestId('shell-actor').textContent()).toContain('Lena Hartwick');
  });

  it('tells a contractor who types /people that only administrators manage people', async () => {
    const page = await watched(await (await browser.newContext({ viewport: phone })).newPage());
    await signIn(page, demoEmail('contractor'), demoPassword);
    await expect.poll(() => page.getByTestId('shell-actor').textContent()).toContain('Contractor');
    await page.goto(`${base}/people`);
    await expect.poll(() => page.getByTestId('admin-only').textContent()).toContain('Only administrators manage people');
    expect(await page.getByTestId('invite-open').count()).toBe(0);
  });

  it('raised no script error on any page', () => {
    expect(pageErrors).toEqual([]);
  });
});
