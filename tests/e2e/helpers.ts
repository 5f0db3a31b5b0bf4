// What the browser tests share: signing in as a demo person, filling fields, whole-page screenshots.
import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { demoEmail, demoPassword } from '../../server/demo/demoScenario';
import { roleLabels, type Role } from '../../shared/roles';
import { testServerEnv } from '../support/testSettings';

export const base = testServerEnv('e2e').PUBLIC_URL;

export async function signInAs(page: Page, role: Role) {
  await page.goto(`${base}/`);
  await page.waitForURL(/\/sign-in/);
  await page.getByTestId('sign-in-email').fill(demoEmail(role));
  await page.getByTestId('sign-in-password').fill(demoPassword);
  await page.getByTestId('sign-in-submit').click();
  await expect.poll(() => page.getByTestId('shell-actor').textContent()).toContain(roleLabels[role]);
}

// The app scrolls inside its own view, not the document, so a full-page shot would stop at the
// window: grow the window to the content for the shot, then put it back.
export async function screenshotWhole(page: Page, vp: { width: number; height: number }, path: string) {
  // A string, because this file is checked without the DOM's types.
  const contentHeight = await page.evaluate<number>(`(() => {
    let tallest = document.documentElement.scrollHeight;
    for (const el of document.querySelectorAll('div')) {
      if (el.scrollHeight > el.clientHeight) tallest = Math.max(tallest, el.scrollHeight + el.getBoundingClientRect().top);
    }
    return Math.ceil(tallest);
  })()`);
  await page.setViewportSize({ width: vp.width, height: Math.max(vp.height, Math.min(contentHeight, 8000)) });
  await page.screenshot({ path });
  await page.setViewportSize({ width: vp.width, height: vp.height });
}

// Fills text fields by test id, in the order given (the form validates as it is touched).
export async function fillFields(page: Page, values: Record<string, string>) {
  for (const [testId, value] of Object.entries(values)) await page.getByTestId(testId).fill(value);
}

type CaughtMail = { to: string; subject: string; text: string; sentAt: string };

// The caught mail (development route) to `to` whose subject holds `subjectPart`, waiting for the
// job worker to deliver it.
export async function mailFor(to: string, subjectPart: string): Promise<CaughtMail | undefined> {
  const deadline = Date.now() + 15_000;
  while (Date.now() < deadline) {
    const all = (await (await fetch(`${base}/api/dev/mail`)).json()) as CaughtMail[];
    const hit = all.find((m) => m.to.includes(to) && m.subject.includes(subjectPart));
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 200));
  }
  return undefined;
}
