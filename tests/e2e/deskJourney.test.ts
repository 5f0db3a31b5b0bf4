// One deck placement request carried across every desk through the web app, each person signed
// in on their own: the contractor files it with a photo, the section engineer returns it with a
// comment, the contractor revises and resubmits, the section engineer forwards it, central office
// routes it, the engineer of record approves it with two conditions, the field inspector confirms
// both on site, and the auditor exports the trail and sees the chain verify. Each desk is told by
// e-mail when the request reaches it. Once at phone size and once on a wide screen, with a
// screenshot of every screen on the way.
import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoEmail } from '../../server/demo/demoScenario';
import type { Role } from '../../shared/roles';
import { genesisHash } from '../../shared/trail/canonicalJson';
import { launchChromium } from '../support/browser';
import { samplePhoto } from '../support/sampleFiles';
import { artifactsDir } from '../support/testSettings';
import { attachFile, fillDeckPlacement, fillDeckReasonAndSchedule, fillRetarder, nextStep, openNewRequest, steps } from './filingSteps';
import { base, fillFields, mailFor, screenshotWhole, signInAs } from './helpers';

const shots = join(artifactsDir(), 'screenshots');
const downloads = join(artifactsDir(), 'downloads');

const viewports = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1440, height: 900 },
] as const;

const conditions = [
  { text: 'Set-time trial batch of the Type D mix witnessed and logged before the pour', dueBefore: 'before placement' },
  { text: 'Second boom pump on site and tested before the first truck is discharged', dueBefore: 'on the morning of placement' },
];

describe.each(viewports)('a deck placement request across every desk ($name)', (vp) => {
  let browser: Browser;
  let context: BrowserContext | null = null;
  let page: Page;
  let number = '';
  const title = `Place the three-span deck in one pour (${vp.name} ${Date.now().toString(36)})`;
  let shotNo = 0;
  const shot = (name: string) => screenshotWhole(page, vp, join(shots, `journey-${vp.name}-${String(++shotNo).padStart(2, '0')}-${name}.png`));

  // Each desk in a browser of its own, as each person would be on their own device.
  async function as(role: Role) {
    await context?.close();
    context = await browser.newContext({ viewport: { width: vp.width, height: vp.height }, acceptDownloads: true });
    page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    await signInAs(page, role);
    return errors;
  }

  // From My desk: the request is waiting there, and opens (as a page on a phone, beside the list on
  // a wide screen) with its number in the header.
  async function openFromDesk() {
    const waiting = page.getByTestId('desk-waiting');
    await expect.poll(() => waiting.textContent(), { timeout: 15_000 }).toContain(number);
    await shot('desk');
    await waiting.getByTestId('request-card').filter({ hasText: number }).click();
    await expect.poll(() => page.getByTestId('request-detail').textContent()).toContain(number);
    if (vp.name === 'wide') expect(page.url()).toMatch(/[?&]selected=[0-9a-f-]{36}/);
    else expect(page.url()).toMatch(/\/requests\/[0-9a-f-]{36}$/);
  }

  // A chosen move is pressed again to unchoose it, so it is pressed only when not chosen yet.
  async function move(action: string, comment: string | null, expectedState: string, alreadyChosen = false) {
    if (!alreadyChosen) await page.getByTestId(`action-${action}`).click();
    if (comment) await page.getByTestId('action-comment').fill(comment);
    await shot(`${action}-chosen`);
    await page.getByTestId('action-send').click();
    await expect.poll(() => page.getByTestId('request-state').textContent(), { timeout: 15_000 }).toBe(expectedState);
  }

  async function expectMailed(role: Role, subjectPart: string) {
    const mail = await mailFor(demoEmail(role), subjectPart);
    expect(mail, `mail to the ${role} about ${subjectPart}`).toBeDefined();
    expect(mail!.text).toContain(number);
  }

  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    mkdirSync(downloads, { recursive: true });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await context?.close();
    await browser?.close();
  });

  it('the contractor files a deck placement change with a photo', async () => {
    const errors = await as('contractor');
    await shot('contractor-desk');
    await openNewRequest(page, 'deck_placement_change');
    await nextStep(page, steps.where);
    await fillFields(page, { 'filing-title': title, 'filing-location': 'Full deck, abutment 1 to abutment 2', 'filing-plan-sheets': 'S-6, S-7' });
    await nextStep(page, steps.departure);
    await fillDeckPlacement(page);
    await fillRetarder(page);
    await fillDeckReasonAndSchedule(page);
    await expect.poll(() => page.getByTestId('filing-check-verdict').textContent()).toBe('Acceptable by these checks');
    await shot('filing-check');
    await nextStep(page, steps.files);
    await attachFile(page, { name: 'pump positions at pier 1.jpg', mimeType: 'image/jpeg', buffer: await samplePhoto(320, 240, '#7b8590') });
    await nextStep(page, steps.review);
    await shot('filing-review');
    await page.getByTestId('filing-submit').click();
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}(\?filed=1)?$/, { timeout: 30_000 });
    await expect.poll(() => page.getByTestId('request-state').textContent()).toBe('With the section engineer');
    number = ((await page.getByTestId('request-detail').textContent()) ?? '').match(/PC-0114-\d{3}/)?.[0] ?? '';
    expect(number).not.toBe('');
    expect(await page.getByTestId('request-attachments').textContent()).toContain('pump positions at pier 1.jpg');
    await shot('filed');
    await expectMailed('section_engineer', number);
    expect(errors).toEqual([]);
  });

  it('the section engineer returns it for revision with a comment', async () => {
    const errors = await as('section_engineer');
    await openFromDesk();
    await shot('section-engineer-reads');
    // Returning needs a reason: the panel says so before anything is sent.
    await page.getByTestId('action-return_for_revision').click();
    await page.getByTestId('action-send').click();
    await expect.poll(() => page.getByTestId('action-panel').textContent()).toContain('Say why it goes back for revision');
    await move('return_for_revision', 'Show the pump positions at both piers and the washout area; the photo covers pier 1 only.', 'Returned for revision', true);
    await expectMailed('contractor', number);
    expect(errors).toEqual([]);
  });

  it('the contractor revises the request and resubmits it', async () => {
    const errors = await as('contractor');
    await openFromDesk();
    expect(await page.getByTestId('request-trail').textContent()).toContain('the photo covers pier 1 only');
    await page.getByTestId('request-revise').click();
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}\/edit/);
    await nextStep(page, steps.where);
    await nextStep(page, steps.departure);
    await page.getByTestId('filing-reason').fill('Two pumps are on hand for the whole day, one at each pier; one placement removes the joints over the piers.');
    await nextStep(page, steps.files);
    await attachFile(page, { name: 'pump positions at pier 2.jpg', mimeType: 'image/jpeg', buffer: await samplePhoto(320, 240, '#6f7a84') });
    await nextStep(page, steps.review);
    await page.getByTestId('filing-resubmit-comment').fill('Added the pier 2 pump position photo; the reason names both piers.');
    await shot('revision-review');
    await page.getByTestId('filing-submit').click();
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await expect.poll(() => page.getByTestId('request-state').textContent()).toBe('With the section engineer');
    await shot('resubmitted');
    await expectMailed('section_engineer', number);
    expect(errors).toEqual([]);
  });

  it('the section engineer sees what changed and forwards it to central office', async () => {
    const errors = await as('section_engineer');
    await openFromDesk();
    expect(await page.getByTestId('request-revisions').count()).toBe(1);
    await expect.poll(() => page.getByTestId('request-changes').textContent()).toContain('one at each pier');
    await shot('section-engineer-sees-changes');
    await move('forward', 'Checked on site: pump pads at both piers are level and clear of the falsework.', 'With central office for routing');
    await expectMailed('central_office', number);
    expect(errors).toEqual([]);
  });

  it('central office routes it to the engineer of record', async () => {
    const errors = await as('central_office');
    await openFromDesk();
    await page.getByTestId('action-route').click();
    await page.getByTestId('action-eor').filter({ hasText: 'Ruth Caldera' }).click();
    await move('route', null, 'With the engineer of record', true);
    await expectMailed('engineer_of_record', number);
    expect(errors).toEqual([]);
  });

  it('the engineer of record approves it with two conditions', async () => {
    const errors = await as('engineer_of_record');
    await openFromDesk();
    // The stored check is what the engineer of record reads, with its caution.
    await expect.poll(() => page.getByTestId('request-engineering').textContent()).toContain('run at submit');
    await page.getByTestId('action-approve_with_conditions').click();
    await page.getByTestId('action-condition-add').click();
    const rows = page.getByTestId('action-condition');
    for (const [i, c] of conditions.entries()) {
      await rows.nth(i).getByTestId('action-condition-text').fill(c.text);
      await rows.nth(i).getByTestId('action-condition-due').fill(c.dueBefore);
    }
    await move('approve_with_conditions', 'Approved for one placement provided both conditions are met.', 'Approved with conditions; conditions open', true);
    const listed = await page.getByTestId('request-conditions').textContent();
    for (const c of conditions) expect(listed).toContain(c.text);
    await shot('approved-with-conditions');
    await expectMailed('field_inspector', number);
    expect(errors).toEqual([]);
  });

  it('the field inspector confirms both conditions on site', async () => {
    const errors = await as('field_inspector');
    await page.getByTestId('nav-conditions').click();
    const group = page.getByTestId('condition-request').filter({ hasText: number });
    await expect.poll(() => group.getByTestId('condition-card').count(), { timeout: 15_000 }).toBe(2);
    await shot('conditions-open');
    const notes = ['Trial batch initial set 11 h 40 min (ASTM C403), logged on the pour card.', 'Second pump set up at pier 2 and run with water at 06:10.'];
    for (const [i, note] of notes.entries()) {
      const card = group.getByTestId('condition-card').nth(i);
      await card.getByTestId('condition-satisfy').click();
      await card.getByTestId('condition-note').fill(note);
      const chooser = page.waitForEvent('filechooser');
      await card.getByTestId('condition-evidence').click();
      await (await chooser).setFiles({ name: `condition ${i + 1} evidence.jpg`, mimeType: 'image/jpeg', buffer: await samplePhoto(240, 180, '#5f6b73') });
      await card.getByTestId('condition-submit').click();
      await expect.poll(() => card.getByTestId('condition-status').textContent(), { timeout: 15_000 }).toBe('Met');
    }
    await shot('conditions-met');
    await group.getByTestId('condition-request-link').click();
    await expect.poll(() => page.getByTestId('request-state').textContent(), { timeout: 15_000 }).toBe('Closed (approved)');
    await shot('closed');
    expect(errors).toEqual([]);
  });

  it('the auditor finds it, sees the chain verify and exports the trail', async () => {
    const errors = await as('auditor');
    await page.getByTestId('nav-trail').click();
    await expect.poll(() => page.getByTestId('trail-result').count(), { timeout: 15_000 }).toBeGreaterThan(0);
    if (vp.name === 'phone') await page.getByTestId('trail-search-toggle').click();
    await page.getByTestId('trail-search-number').fill(number);
    await page.getByTestId('trail-search-submit').click();
    const result = page.getByTestId('trail-result').filter({ hasText: number });
    await expect.poll(() => page.getByTestId('trail-result').count()).toBe(1);
    await result.click();
    await expect.poll(() => page.getByTestId('trail-verify-result').textContent(), { timeout: 15_000 }).toMatch(/^Verified: all \d+ entries link up/);
    const entries = await page.getByTestId('trail-entry').count();
    // Started, submitted, returned, resubmitted, forwarded, routed, approved, two conditions met.
    expect(entries).toBeGreaterThanOrEqual(9);
    await shot('auditor-trail');

    const download = page.waitForEvent('download');
    await page.getByTestId('trail-export-csv').click();
    const csv = await download;
    const path = join(downloads, `journey-${vp.name}.csv`);
    await csv.saveAs(path);
    // Every link recomputed from the export alone: SHA-256 of the previous hash and the hashed event.
    const rows = readFileSync(path, 'utf8').split('\r\n').filter(Boolean).slice(1);
    expect(rows).toHaveLength(entries);
    let previous = genesisHash;
    for (const row of rows) {
      const [prevHash, hash] = row.match(/[0-9a-f]{64}/g)!;
      expect(prevHash).toBe(previous);
      const hashedEvent = row.slice(row.indexOf(hash!) + 65).replace(/^"|"$/g, '').replace(/""/g, '"');
      expect(createHash('sha256').update(prevHash! + hashedEvent).digest('hex')).toBe(hash);
      previous = hash!;
    }
    expect(rows.some((r) => r.includes('approve_with_conditions'))).toBe(true);
    expect(errors).toEqual([]);
  });
});
