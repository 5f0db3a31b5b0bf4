// The walking skeleton through the browser: a contractor files a request with a drawing, the
// section engineer is mailed and finds it at their desk. Once at phone size, once on a wide screen.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoEmail, demoPassword } from '../../server/demo/demoScenario';
import { launchChromium } from '../support/browser';
import { artifactsDir, testServerEnv } from '../support/testSettings';

const env = testServerEnv('e2e');
const base = env.PUBLIC_URL;
const shots = join(artifactsDir(), 'screenshots');

const viewports = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1440, height: 900 },
];

type CaughtMail = { to: string; subject: string; text: string; sentAt: string };

async function signInAs(page: Page, role: 'contractor' | 'section_engineer') {
  await page.goto(`${base}/`);
  await page.waitForURL(/\/sign-in/);
  await page.getByTestId('sign-in-email').fill(demoEmail(role));
  await page.getByTestId('sign-in-password').fill(demoPassword);
  await page.getByTestId('sign-in-submit').click();
  await expect.poll(() => page.getByTestId('shell-actor').textContent()).toContain(role === 'contractor' ? 'Contractor' : 'Section engineer');
}

async function mailFor(to: string, subjectPart: string): Promise<CaughtMail | undefined> {
  const deadline = Date.now() + 15_000;
  while (Date.now() < deadline) {
    const all = (await (await fetch(`${base}/api/dev/mail`)).json()) as CaughtMail[];
    const hit = all.find((m) => m.to.includes(to) && m.subject.includes(subjectPart));
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 200));
  }
  return undefined;
}

describe('filing a request through the web app', () => {
  let browser: Browser;
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
  });

  for (const vp of viewports) {
    it(`contractor files, section engineer sees it (${vp.name} ${vp.width}×${vp.height})`, async () => {
      const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
      const page = await context.newPage();
      const shot = (step: string) => page.screenshot({ path: join(shots, `${vp.name}-${step}.png`), fullPage: true });
      const title = `Place span 2 deck in one pour (${vp.name})`;

      await signInAs(page, 'contractor');
      await shot('1-contractor-desk');
      await page.getByTestId('desk-new-request').click();
      await page.waitForURL(/\/requests\/new/);

      // The form refuses an empty submission and says which fields need attention.
      await page.getByTestId('filing-submit').click();
      await expect.poll(() => page.getByText('The title needs at least 5 characters.').count()).toBe(1);

      await page.getByTestId('filing-title').fill(title);
      await page.getByTestId('filing-reason').fill('Pump capacity allows a single placement with Type D retarded concrete instead of the three phases on sheet S-6.');
      const chooser = page.waitForEvent('filechooser');
      await page.getByTestId('filing-add-files').click();
      await (await chooser).setFiles({ name: 'S-6 placement sequence.pdf', mimeType: 'application/pdf', buffer: Buffer.from('%PDF-1.4\n% sheet S-6\n%%EOF\n') });
      await expect.poll(() => page.getByTestId('filing-file').count()).toBe(1);
      await shot('2-filing-form');
      await page.getByTestId('filing-submit').click();

      await page.waitForURL(/\/requests\/[0-9a-f-]{36}$/);
      const detail = page.getByTestId('request-detail');
      await expect.poll(() => detail.textContent()).toContain(title);
      const header = (await detail.textContent()) ?? '';
      const number = /PC-0114-\d{3}/.exec(header)?.[0];
      expect(number, `request number in "${header}"`).toBeTruthy();
      expect(await page.getByText('S-6 placement sequence.pdf').count()).toBe(1);
      await shot('3-filed-request');

      const mail = await mailFor(demoEmail('section_engineer'), number!);
      expect(mail, 'mail to the section engineer').toBeDefined();
      expect(mail!.text).toContain(title);

      await page.getByTestId('shell-sign-out').click();
      await page.waitForURL(/\/sign-in/);
      await signInAs(page, 'section_engineer');
      const waiting = page.getByTestId('desk-waiting');
      await expect.poll(() => waiting.textContent()).toContain(number!);
      await shot('4-section-engineer-desk');

      await page.getByText(title).first().click();
      await page.waitForURL(/\/requests\/[0-9a-f-]{36}$/);
      await expect.poll(() => page.getByTestId('request-detail').textContent()).toContain(number!);
      await shot('5-section-engineer-request');
      await context.close();
    });
  }
});
