// A contractor on a deck with no signal: the draft is kept on the phone and queued, sent to
// Spanrelay when the connection returns, and offered again when the screen is opened later.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestPage } from '../../shared/requests/types';
import { launchChromium } from '../support/browser';
import { artifactsDir } from '../support/testSettings';
import { attachFile, nextStep, openNewRequest, stepText, steps } from './filingSteps';
import { base, fillFields, screenshotWhole, signInAs } from './helpers';

const shots = join(artifactsDir(), 'screenshots');
const phone = { width: 390, height: 844 };
const keptNotice = 'Saved on this device; it will be sent when the connection returns.';

describe('a draft saved without a connection', () => {
  let browser: Browser;
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('is kept on the device, sent when the connection returns, and offered again later', async () => {
    const context = await browser.newContext({ viewport: phone });
    const page = await context.newPage();
    const shot = (name: string) => screenshotWhole(page, phone, join(shots, name));
    const title = `Drain outlet at pier 2, typed offline ${Date.now().toString(36)}`;
    const reason = 'The outlet as drawn on sheet D-3 lands on the pier cap step; the downspout cannot clear it.';

    await signInAs(page, 'contractor');
    await openNewRequest(page);
    await nextStep(page, steps.where);
    await fillFields(page, { 'filing-title': title, 'filing-location': 'Deck drain DR-4 over pier 2, north fascia' });

    await context.setOffline(true);
    await expect.poll(() => page.getByTestId('filing-offline').count()).toBe(1);
    await nextStep(page, steps.departure);
    await fillFields(page, {
      'filing-reason': reason,
      'filing-proposed-change': 'Move the outlet 18 in toward span 3 and extend the downspout with two 45° bends.',
      'filing-needed-by': '2027-04-15',
      'filing-time-impact': '0',
    });
    await page.getByTestId('filing-cost-none').click();
    await nextStep(page, steps.files);
    // Files cannot go up without a connection: the screen says so and keeps the file listed.
    expect(await page.getByTestId('filing-files-offline').textContent()).toContain('cannot be uploaded now');
    await attachFile(page, { name: 'D-3 outlet photo.pdf', mimeType: 'application/pdf', buffer: Buffer.from('%PDF-1.4\n%%EOF\n') });

    await page.getByTestId('filing-save-draft').click();
    await expect.poll(() => page.getByTestId('draft-notice').textContent()).toBe(keptNotice);
    await shot('offline-1-kept-on-device.png');
    // Kept in the browser's storage under this person, with what was typed.
    const stored = await page.evaluate<string>(`JSON.stringify(Object.keys(localStorage).filter((k) => k.startsWith('spanrelay.draft.')).map((k) => localStorage.getItem(k)))`);
    const kept = (JSON.parse(stored) as string[]).map((raw) => JSON.parse(raw) as { queued: boolean; server: unknown; values: { title: string; reason: string }; fileNames: string[] });
    expect(kept).toHaveLength(1);
    expect(kept[0]).toMatchObject({ queued: true, server: null, values: { title, reason }, fileNames: ['D-3 outlet photo.pdf'] });

    // Back online: the queued draft goes to Spanrelay by itself and the notice says so.
    await context.setOffline(false);
    await expect.poll(() => page.getByTestId('draft-notice').textContent(), { timeout: 15_000 }).toMatch(/^Draft saved to Spanrelay as PC-0114-\d{3}\.$/);
    expect(await page.getByTestId('filing-offline').count()).toBe(0);
    await shot('offline-2-sent.png');
    const number = /PC-0114-\d{3}/.exec((await page.getByTestId('draft-notice').textContent()) ?? '')![0];

    // The server has the draft, with the title typed offline, as the contractor's own.
    const answer = await context.request.get(`${base}/api/requests?state=drafting&sort=newest&limit=100`);
    expect(answer.status()).toBe(200);
    const draft = ((await answer.json()) as RequestPage).items.find((r) => r.number === number);
    expect(draft, `draft ${number} in the list`).toBeDefined();
    expect(draft).toMatchObject({ title, state: 'drafting' });
    const detail = (await (await context.request.get(`${base}/api/requests/${draft!.id}`)).json()) as { revisions: { body: { reason?: string } }[] };
    expect(detail.revisions.at(-1)!.body.reason).toBe(reason);

    // The tab is closed; opening the screen again offers to carry on with this draft.
    await page.close();
    const again = await context.newPage();
    await again.goto(`${base}/requests/new`);
    const offer = again.getByTestId('device-draft-offer');
    await expect.poll(() => offer.textContent()).toContain(title);
    expect(await offer.textContent()).toContain(`Also saved to Spanrelay as ${number}`);
    await screenshotWhole(again, phone, join(shots, 'offline-3-offered-again.png'));
    await again.getByTestId('device-draft-continue').click();
    // Back where it was left, and told which file to pick again: files are not kept on the device.
    await expect.poll(() => stepText(again)).toBe(steps.files);
    expect(await again.getByTestId('filing-files-pick-again').textContent()).toContain('D-3 outlet photo.pdf');
    await again.getByTestId('filing-back').click();
    await expect.poll(() => again.getByTestId('filing-reason').inputValue()).toBe(reason);
    await context.close();
  });

  // Two tabs on one draft: the second save finds the draft moved on, says so, and shows the
  // version on Spanrelay instead of overwriting it.
  it('a save that finds the draft changed elsewhere reloads it instead of overwriting', async () => {
    const context = await browser.newContext({ viewport: phone });
    const page = await context.newPage();
    const title = `Drain outlet at pier 2, saved twice ${Date.now().toString(36)}`;
    await signInAs(page, 'contractor');
    await openNewRequest(page);
    await nextStep(page, steps.where);
    await fillFields(page, { 'filing-title': title, 'filing-location': 'Deck drain DR-4 over pier 2, north fascia' });
    await page.getByTestId('filing-save-draft').click();
    await expect.poll(() => page.getByTestId('draft-notice').textContent(), { timeout: 10_000 }).toMatch(/^Draft saved to Spanrelay as PC-0114-\d{3}\.$/);
    const number = /PC-0114-\d{3}/.exec((await page.getByTestId('draft-notice').textContent()) ?? '')![0];

    // Another tab saves the same draft first, from inside the app's origin.
    const list = (await (await context.request.get(`${base}/api/requests?state=drafting&sort=newest&limit=100`)).json()) as RequestPage;
    const saved = list.items.find((r) => r.number === number)!;
    const theirs = `${title} (their version)`;
    const status = await page.evaluate<number>(`fetch('/api/requests/${saved.id}/draft', {
      method: 'PUT', credentials: 'include', headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ version: ${saved.version}, body: { type: 'other_deviation', projectId: '${saved.project.id}', title: ${JSON.stringify(theirs)} } }),
    }).then((r) => r.status)`);
    expect(status).toBe(200);

    await page.getByTestId('filing-title').fill(`${title} (mine)`);
    await page.getByTestId('filing-save-draft').click();
    await expect.poll(() => page.getByTestId('draft-notice').textContent(), { timeout: 10_000 }).toContain('Someone changed this draft on Spanrelay since you opened it');
    expect(await page.getByTestId('filing-title').inputValue()).toBe(theirs);
    await screenshotWhole(page, phone, join(shots, 'offline-4-changed-elsewhere.png'));

    // Saving again now goes on from their version.
    await page.getByTestId('filing-title').fill(`${theirs}, checked`);
    await page.getByTestId('filing-save-draft').click();
    await expect.poll(() => page.getByTestId('draft-notice').textContent(), { timeout: 10_000 }).toBe(`Draft saved to Spanrelay as ${number}.`);
    const detail = (await (await context.request.get(`${base}/api/requests/${saved.id}`)).json()) as { title: string; version: number };
    expect(detail).toMatchObject({ title: `${theirs}, checked`, version: saved.version + 2 });
    await context.close();
  });
});
