// A deck placement change through the browser: the contractor sees the engineering check and its
// moment diagram while typing, files it, and the request shows the check stored at submit with
// the same plots. Phone size, with one wide shot of the filed request and the demo joint request.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestPage } from '../../shared/requests/types';
import { launchChromium } from '../support/browser';
import { artifactsDir } from '../support/testSettings';
import { fillDeckPlacement, fillDeckReasonAndSchedule, fillRetarder, nextStep, openNewRequest, stepText, steps } from './filingSteps';
import { base, fillFields, screenshotWhole, signInAs } from './helpers';

const shots = join(artifactsDir(), 'screenshots');
const phone = { width: 390, height: 844 };
const wide = { width: 1440, height: 900 };
const caution = 'engineer of record';

async function fillWhere(page: Page, title: string, where: string) {
  await fillFields(page, { 'filing-title': title, 'filing-location': where });
}

describe('engineering checks in the web app', () => {
  let browser: Browser;
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('contractor sees the live deck check, files it, and the request keeps the check with its plots', async () => {
    const context = await browser.newContext({ viewport: phone });
    const page = await context.newPage();
    const shot = (name: string, vp = phone) => screenshotWhole(page, vp, join(shots, name));
    const title = 'Place the three-span deck in one pour (e2e)';

    await signInAs(page, 'contractor');
    await openNewRequest(page, 'deck_placement_change');
    await nextStep(page, steps.where);
    await fillWhere(page, title, 'Full deck, abutment 1 to abutment 2');
    await nextStep(page, steps.departure);

    await fillDeckPlacement(page);
    // A single placement without a retarder: the check says no, and why.
    const live = page.getByTestId('filing-live-check');
    await expect.poll(() => page.getByTestId('filing-check-verdict').textContent()).toBe('Not acceptable by these checks');
    expect(await live.textContent()).toContain('no retarder or set-time test is given');
    await shot('eng-phone-1-live-check-refused.png');

    await fillRetarder(page);
    await expect.poll(() => page.getByTestId('filing-check-verdict').textContent()).toBe('Acceptable by these checks');
    expect(await live.getByTestId('engineering-moment-diagram').count()).toBe(1);
    expect(await live.getByTestId('engineering-placement-plot').count()).toBe(1);
    expect(await live.getByTestId('engineering-moment-diagram').getAttribute('aria-label')).toContain('Moment diagram of a 3-span girder, 310.0 ft long');
    expect(await live.textContent()).toContain(caution);
    await fillDeckReasonAndSchedule(page);
    await shot('eng-phone-2-live-check.png');

    await nextStep(page, steps.files);
    await nextStep(page, steps.review);
    // The check is read again on the review step, with its caution, before the request goes.
    await expect.poll(() => page.getByTestId('filing-check-verdict').textContent()).toBe('Acceptable by these checks');
    expect(await page.getByTestId('filing-live-check').textContent()).toContain(caution);
    expect(await page.getByTestId('filing-review').textContent()).toContain('95, 120, 95');
    await page.getByTestId('filing-submit').click();
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}(\?filed=1)?$/);
    await expect.poll(() => page.getByTestId('request-filed').count()).toBe(1);
    const stored = page.getByTestId('request-engineering');
    await expect.poll(() => stored.textContent()).toContain('run at submit');
    expect(await page.getByTestId('request-check-verdict').textContent()).toBe('Acceptable by these checks');
    await expect.poll(() => stored.getByTestId('engineering-moment-diagram').count()).toBe(1);
    expect(await stored.getByTestId('engineering-placement-plot').count()).toBe(1);
    expect(await stored.textContent()).toContain(caution);
    expect(await page.getByTestId('request-typed-fields').textContent()).toContain('95, 120, 95');
    await shot('eng-phone-3-filed-request.png');
    await page.setViewportSize(wide);
    // The detail changes to two columns on a wide screen; let it lay out before measuring.
    await expect.poll(() => page.getByTestId('request-trail').count()).toBe(1);
    await page.waitForTimeout(300);
    await shot('eng-wide-4-filed-request.png', wide);

    // The demo joint relocation, filed by the seed: its stored check marks both joints.
    // Found through the API: which list shows it on screen is the desk's and the register's business.
    const found = await context.request.get(`${base}/api/requests?desk=all&q=${encodeURIComponent('construction joint CJ-2')}&limit=5`);
    const demo = ((await found.json()) as RequestPage).items.find((r) => r.title.startsWith('Move deck construction joint CJ-2'));
    expect(demo, 'the demo joint request').toBeDefined();
    await page.goto(`${base}/requests/${demo!.id}`);
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}$/);
    const jointCheck = page.getByTestId('request-engineering');
    await expect.poll(() => jointCheck.getByTestId('engineering-moment-diagram').count()).toBe(1);
    expect(await jointCheck.getByTestId('engineering-moment-diagram').getAttribute('aria-label')).toContain('The plans put the joint at 190.0 ft');
    await shot('eng-wide-5-demo-joint.png', wide);
    await context.close();
  });

  it('the seal substitution check draws the opening plot and will not file without the data sheet', async () => {
    const context = await browser.newContext({ viewport: phone });
    const page = await context.newPage();
    await signInAs(page, 'contractor');
    await openNewRequest(page, 'joint_seal_substitution');
    await nextStep(page, steps.where);
    await fillWhere(page, 'Compression seal in place of the strip seal at abutment 2 (e2e)', 'Expansion joint at abutment 2');
    await nextStep(page, steps.departure);
    await page.getByTestId('filing-joint-location').fill('Abutment 2');
    await page.getByTestId('filing-specified-kind-strip_seal').click();
    await fillFields(page, {
      'filing-specified-capacity': '4',
      'filing-specified-min': '0.5',
      'filing-specified-max': '4.5',
    });
    await page.getByTestId('filing-substitute-kind-compression_seal').click();
    await fillFields(page, {
      'filing-substitute-capacity': '2',
      'filing-substitute-min': '1',
      'filing-substitute-max': '3',
      'filing-contributing-length': '300',
    });
    await page.getByTestId('filing-material-concrete').click();
    await page.getByTestId('filing-climate-moderate').click();
    await fillFields(page, {
      'filing-install-temp': '64',
      'filing-gap-reference': '2',
      'filing-reference-temp': '60',
    });

    const live = page.getByTestId('filing-live-check');
    await expect.poll(() => page.getByTestId('filing-check-verdict').textContent()).toBe('Not acceptable by these checks');
    // The plot is drawn once its width is measured.
    await expect.poll(() => live.getByTestId('engineering-opening-plot').count()).toBe(1);
    expect(await page.getByTestId('engineering-seal-facts').textContent()).toContain('compression seal');
    expect(await live.textContent()).toContain(caution);

    await fillDeckReasonAndSchedule(page);
    await nextStep(page, steps.files);
    // The step with the files will not be left without the data sheet.
    await page.getByTestId('filing-next').click();
    await expect.poll(() => page.getByTestId('filing-needs-attention').count()).toBe(1);
    expect(await page.getByTestId('filing-files-error').textContent()).toContain('data sheet');
    expect(await stepText(page)).toBe(steps.files);
    await screenshotWhole(page, phone, join(shots, 'eng-phone-6-seal-check.png'));
    await context.close();
  });
});
