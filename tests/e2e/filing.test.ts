// The walking skeleton through the browser: a contractor files a request with a drawing, step by
// step, the section engineer is mailed, finds it at their desk and forwards it to central office
// with a comment. Once at phone size, once on a wide screen.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoEmail } from '../../server/demo/demoScenario';
import { launchChromium } from '../support/browser';
import { artifactsDir } from '../support/testSettings';
import { attachFile, nextStep, openNewRequest, stepText, steps } from './filingSteps';
import { base, fillFields, mailFor, screenshotWhole, signInAs } from './helpers';

const shots = join(artifactsDir(), 'screenshots');

const viewports = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1440, height: 900 },
];

async function fillWhere(page: Page, title: string) {
  await fillFields(page, {
    'filing-title': title,
    'filing-location': 'Deck drain DR-4 over pier 2, north fascia',
    'filing-span': '2',
    'filing-station': '12+40',
    'filing-plan-sheets': 'S-12, D-3',
  });
}

async function fillChange(page: Page) {
  await fillFields(page, {
    'filing-reason': 'The outlet as drawn on sheet D-3 lands on the pier cap step; the downspout cannot clear it.',
    'filing-proposed-change': 'Move the outlet 18 in toward span 3 and extend the downspout with two 45° bends.',
    'filing-needed-by': '2027-04-15',
  });
  await page.getByTestId('filing-cost-added_cost').click();
  await page.getByTestId('filing-cost-amount').fill('1850');
  await page.getByTestId('filing-time-impact').fill('0');
}

const drawing = { name: 'D-3 drain outlet markup.pdf', mimeType: 'application/pdf', buffer: Buffer.from('%PDF-1.4\n% sheet D-3\n%%EOF\n') };

// Every step filled in, ending on the review step.
async function fillOtherDeviation(page: Page, title: string) {
  await nextStep(page, steps.where);
  await fillWhere(page, title);
  await nextStep(page, steps.departure);
  await fillChange(page);
  await nextStep(page, steps.files);
  await attachFile(page, drawing);
  await nextStep(page, steps.review);
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
    it(`contractor files, section engineer forwards it (${vp.name} ${vp.width}×${vp.height})`, async () => {
      const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
      const page = await context.newPage();
      const shot = (step: string) => screenshotWhole(page, vp, join(shots, `${vp.name}-${step}.png`));
      const title = `Relocate deck drain outlet at pier 2 (${vp.name})`;

      await signInAs(page, 'contractor');
      await shot('1-contractor-desk');
      await openNewRequest(page);
      await nextStep(page, steps.where);

      // Each step refuses to be left empty and says which fields need attention, on that step only.
      await page.getByTestId('filing-next').click();
      await expect.poll(() => page.getByText('Enter a title (at least 5 characters).').count()).toBe(1);
      await expect.poll(() => page.getByTestId('filing-needs-attention').count()).toBe(1);
      expect(await stepText(page)).toBe(steps.where);
      expect(await page.getByText('Say whether the change costs more, less, or the same.').count()).toBe(0);
      await shot('2-filing-refused');

      await fillWhere(page, title);
      expect(await page.getByTestId('filing-needs-attention').count()).toBe(0);
      await nextStep(page, steps.departure);
      await page.getByTestId('filing-next').click();
      await expect.poll(() => page.getByText('Say whether the change costs more, less, or the same.').count()).toBe(1);
      expect(await page.getByTestId('filing-needs-attention').count()).toBe(1);
      expect(await stepText(page)).toBe(steps.departure);

      await fillChange(page);
      await nextStep(page, steps.files);
      await attachFile(page, drawing);
      await nextStep(page, steps.review);
      expect(await page.getByTestId('filing-needs-attention').count()).toBe(0);
      // The review reads the request back before it goes.
      const review = (await page.getByTestId('filing-review').textContent()) ?? '';
      expect(review).toContain(title);
      expect(review).toContain('12+40');
      expect(review).toContain('D-3 drain outlet markup.pdf');
      await shot('3-filing-review');
      await page.getByTestId('filing-submit').click();

      await page.waitForURL(/\/requests\/[0-9a-f-]{36}(\?filed=1)?$/);
      await expect.poll(() => page.getByTestId('request-filed').count()).toBe(1);
      const detail = page.getByTestId('request-detail');
      await expect.poll(() => detail.textContent()).toContain(title);
      const header = (await detail.textContent()) ?? '';
      const number = /PC-0114-\d{3}/.exec(header)?.[0];
      expect(number, `request number in "${header}"`).toBeTruthy();
      expect(header).toContain('With the section engineer');
      expect(await page.getByText('D-3 drain outlet markup.pdf').count()).toBe(1);
      expect(await page.getByTestId('request-cost').textContent()).toContain('1,850');
      expect(await page.getByTestId('request-location').textContent()).toContain('station 12+40');
      await shot('4-filed-request');

      const mail = await mailFor(demoEmail('section_engineer'), number!);
      expect(mail, 'mail to the section engineer').toBeDefined();
      expect(mail!.text).toContain(title);

      await page.getByTestId('shell-sign-out').click();
      await page.waitForURL(/\/sign-in/);
      await signInAs(page, 'section_engineer');
      const waiting = page.getByTestId('desk-waiting');
      await expect.poll(() => waiting.textContent()).toContain(number!);
      await shot('5-section-engineer-desk');

      // By number, not title: the e2e database keeps requests from earlier runs with the same title.
      await waiting.getByTestId('request-card').filter({ hasText: number! }).click();
      // A page of its own on a phone; beside the list (?selected=…) on a wide screen.
      await page.waitForURL(/(\/requests\/|[?&]selected=)[0-9a-f-]{36}$/);
      await expect.poll(() => page.getByTestId('request-detail').textContent()).toContain(number!);
      await shot('6-section-engineer-request');

      // Forward through the action panel: choose the move, say why, send.
      await page.getByTestId('action-forward').click();
      const comment = 'Checked on site: the pier cap step is as built. The longer downspout clears it; no conflict with the bearing.';
      await page.getByTestId('action-comment').fill(comment);
      await shot('7-forwarding');
      await page.getByTestId('action-send').click();
      await expect.poll(() => page.getByTestId('request-state').textContent()).toBe('With central office for routing');
      await expect.poll(() => page.getByTestId('action-done').textContent()).toContain('Forwarded to central office');
      const trail = (await page.getByTestId('request-trail').textContent()) ?? '';
      expect(trail).toContain('Forwarded to central office');
      expect(trail).toContain(comment);
      expect(await page.getByTestId('action-forward').count()).toBe(0);
      await shot('8-forwarded');
      await context.close();
    });
  }

  // The draft is saved but storing its files fails: the person is told, nothing is lost, and
  // pressing the button again finishes the same request instead of starting a second one.
  it('a failed upload keeps the draft, and filing again completes it', async () => {
    const vp = viewports[0]!;
    const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
    const page = await context.newPage();
    const title = 'Relocate deck drain outlet at pier 2 (retry)';
    await signInAs(page, 'contractor');
    await openNewRequest(page);
    await fillOtherDeviation(page, title);

    const storageDown = JSON.stringify({ error: { code: 'storage_unavailable', message: 'File storage is not reachable right now; nothing was saved. Try again shortly.' } });
    await page.route('**/api/requests/*/attachments*', (route) => route.fulfill({ status: 503, contentType: 'application/json', body: storageDown }));
    await page.getByTestId('filing-submit').click();
    await expect.poll(() => page.getByTestId('filing-failure').textContent()).toContain('The draft is saved, but its files were not stored.');
    const failure = (await page.getByTestId('filing-failure').textContent()) ?? '';
    const number = /PC-0114-\d{3}/.exec(failure)?.[0];
    expect(number, `draft number in "${failure}"`).toBeTruthy();
    expect(await page.getByTestId('filing-draft-link').count()).toBe(1);
    await screenshotWhole(page, vp, join(shots, 'phone-9-upload-failed.png'));

    await page.unroute('**/api/requests/*/attachments*');
    await page.getByTestId('filing-submit').click();
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}(\?filed=1)?$/);
    await expect.poll(() => page.getByTestId('request-detail').textContent()).toContain(number!);
    expect(await page.getByTestId('request-state').textContent()).toBe('With the section engineer');
    expect(await page.getByText('D-3 drain outlet markup.pdf').count()).toBe(1);
    await context.close();
  });
  // A slow upload shows its own bar and can be cancelled; the request is then filed without it.
  it('shows each file’s progress and lets the contractor cancel a slow upload', async () => {
    const vp = viewports[0]!;
    const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
    const page = await context.newPage();
    await signInAs(page, 'contractor');
    await openNewRequest(page);
    await fillOtherDeviation(page, 'Relocate deck drain outlet at pier 2 (cancelled upload)');
    // The store never answers, as on a deck with poor signal.
    await page.route('**/api/requests/*/attachments*', () => undefined);
    await page.getByTestId('filing-submit').click();
    const progress = page.getByTestId('upload-progress');
    await expect.poll(() => progress.textContent()).toContain('sending');
    await screenshotWhole(page, vp, join(shots, 'phone-10-upload-in-progress.png'));
    await page.getByTestId('upload-cancel').click();
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}(\?filed=1)?$/);
    expect(await page.getByTestId('request-state').textContent()).toBe('With the section engineer');
    expect(await page.getByTestId('request-attachments').textContent()).toContain('Attachments (0)');
    await context.close();
  });

  // The server refuses the filing and names a field: the person is taken back to the step that
  // shows it, with the server's words beside it, and files once it is put right.
  it('a refusal naming a field sends the contractor back to that step and field', async () => {
    const vp = viewports[0]!;
    const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
    const page = await context.newPage();
    const title = 'Relocate deck drain outlet at pier 2 (refused field)';
    await signInAs(page, 'contractor');
    await openNewRequest(page);
    await fillOtherDeviation(page, title);

    const refusal = 'Name the pier as the plans do, e.g. “pier 2”.';
    const refused = JSON.stringify({ error: { code: 'invalid_input', message: 'The request was not filed; some fields need attention.', fields: { 'location.description': refusal } } });
    await page.route('**/api/requests/*/events', (route) => route.fulfill({ status: 400, contentType: 'application/json', body: refused }));
    await page.getByTestId('filing-submit').click();
    // Saved, stored and refused in turn: three calls before the answer shows.
    await expect.poll(() => stepText(page), { timeout: 15_000 }).toBe(steps.where);
    await expect.poll(() => page.getByText(refusal).count()).toBe(1);
    expect(await page.getByTestId('filing-failure').textContent()).toContain('it was not sent to the section engineer');
    await screenshotWhole(page, vp, join(shots, 'phone-11-refused-field.png'));

    await page.unroute('**/api/requests/*/events');
    await page.getByTestId('filing-location').fill('Deck drain DR-4 over pier 2, north fascia, at the pier cap step');
    await nextStep(page, steps.departure);
    await nextStep(page, steps.files);
    // Stored with the draft on the first try; it stays and is not sent twice.
    expect(await page.getByTestId('filing-file').textContent()).toContain('Saved with the draft');
    await nextStep(page, steps.review);
    await page.getByTestId('filing-submit').click();
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}(\?filed=1)?$/);
    expect(await page.getByTestId('request-location').textContent()).toContain('at the pier cap step');
    expect(await page.getByTestId('request-attachments').textContent()).toContain('Attachments (1)');
    await context.close();
  });
});
