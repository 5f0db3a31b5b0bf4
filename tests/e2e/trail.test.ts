// The auditor traces a request through the web app: searches the trail, is told in place when the
// dates are the wrong way round, opens the demo joint request's trail, sees its chain verified and
// takes the CSV and the decision record away. Once at phone size, once on a wide screen.
import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { genesisHash } from '../../shared/trail/canonicalJson';
import { launchChromium } from '../support/browser';
import { artifactsDir } from '../support/testSettings';
import { base, fillFields, screenshotWhole, signInAs } from './helpers';

const shots = join(artifactsDir(), 'screenshots');
const downloads = join(artifactsDir(), 'downloads');

const viewports = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1440, height: 900 },
];

const jointTitle = 'Move deck construction joint CJ-2 closer to pier 1';
const deckTitle = 'Place the three-span deck in one continuous placement';

describe('the auditor traces a request', () => {
  let browser: Browser;
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    mkdirSync(downloads, { recursive: true });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
  });

  for (const vp of viewports) {
    it(`searches, opens a verified trail and downloads it (${vp.name} ${vp.width}×${vp.height})`, async () => {
      const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height }, acceptDownloads: true });
      const page = await context.newPage();
      const shot = (step: string) => screenshotWhole(page, vp, join(shots, `trail-${vp.name}-${step}.png`));

      await signInAs(page, 'auditor');
      await page.goto(`${base}/trail`);
      await expect.poll(() => page.getByTestId('trail-result').count(), { timeout: 15_000 }).toBeGreaterThanOrEqual(2);
      await shot('1-latest-activity');

      // A phone folds the filters away to show the results first.
      if (vp.name === 'phone') {
        expect(await page.getByTestId('trail-search-summary').textContent()).toContain('No filters');
        await page.getByTestId('trail-search-toggle').click();
      }
      // Dates the wrong way round are refused where they were typed.
      await fillFields(page, { 'trail-search-from': '2026-12-05', 'trail-search-to': '2026-12-01' });
      await page.getByTestId('trail-search-submit').click();
      await expect.poll(() => page.getByText('The end date is before the start date.').count()).toBe(1);
      await shot('2-dates-refused');

      // Central office routed the joint request; it never touched the deck request.
      await fillFields(page, { 'trail-search-from': '', 'trail-search-to': '', 'trail-search-person': 'Marcus Trell', 'trail-search-structure': '27-0114' });
      await page.getByTestId('trail-search-decision-undecided').click();
      await page.getByTestId('trail-search-submit').click();
      await page.waitForURL(/person=Marcus/);
      const results = page.getByTestId('trail-result');
      await expect.poll(async () => (await results.allTextContents()).join('\n')).toContain(jointTitle);
      expect((await results.allTextContents()).join('\n')).not.toContain(deckTitle);
      await shot('3-found');

      await results.filter({ hasText: jointTitle }).first().click();
      await page.waitForURL(/\/trail\/[0-9a-f-]{36}$/);
      await expect.poll(() => page.getByTestId('trail-verify-result').textContent(), { timeout: 15_000 }).toMatch(/^Verified: all \d+ entries link up/);
      const entries = await page.getByTestId('trail-entry').count();
      expect(entries).toBeGreaterThanOrEqual(4);
      expect(await page.getByTestId('trail-request').textContent()).toContain('PC-0114-004');
      await shot('4-trail-verified');

      const csvDownload = page.waitForEvent('download');
      await page.getByTestId('trail-export-csv').click();
      const csv = await csvDownload;
      expect(csv.suggestedFilename()).toBe('PC-0114-004-trail.csv');
      const csvPath = join(downloads, `${vp.name}-trail.csv`);
      await csv.saveAs(csvPath);
      const lines = readFileSync(csvPath, 'utf8').split('\r\n').filter(Boolean);
      expect(lines[0]).toBe('seq,at,actor_name,actor_organization,actor_role,event,state_before,state_after,comment,prev_hash,hash,hashed_event');
      // The demo comments hold no line breaks, so each entry is one line; its first link starts the chain.
      expect(lines).toHaveLength(entries + 1);
      const first = lines[1]!;
      const [prevHash, hash] = first.match(/[0-9a-f]{64}/g)!;
      expect(prevHash).toBe(genesisHash);
      const hashedEvent = first.slice(first.indexOf(hash!) + 65).replace(/^"|"$/g, '').replace(/""/g, '"');
      expect(JSON.parse(hashedEvent)).toMatchObject({ seq: 1, stateBefore: null, stateAfter: 'drafting' });
      expect(createHash('sha256').update(prevHash! + hashedEvent).digest('hex')).toBe(hash);

      const pdfDownload = page.waitForEvent('download');
      await page.getByTestId('trail-export-pdf').click();
      const pdf = await pdfDownload;
      expect(pdf.suggestedFilename()).toBe('PC-0114-004-decision-record.pdf');
      const pdfPath = join(downloads, `${vp.name}-decision-record.pdf`);
      await pdf.saveAs(pdfPath);
      expect(readFileSync(pdfPath).subarray(0, 5).toString('latin1')).toBe('%PDF-');

      await page.getByTestId('trail-back').click();
      await page.waitForURL(/\/trail\?.*person=Marcus/);
      if (vp.name === 'phone') {
        await expect.poll(() => page.getByTestId('trail-search-summary').textContent()).toContain('person Marcus Trell');
      } else {
        expect(await page.getByTestId('trail-search-person').inputValue()).toBe('Marcus Trell');
      }
      await context.close();
    });
  }
});
