// Moving through the new-request steps in the browser tests.
import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { fillFields } from './helpers';

export const stepText = (page: Page) => page.getByTestId('filing-step').textContent();

/** Opens the new-request screen from the contractor's desk, at step 1. */
export async function openNewRequest(page: Page, type?: string) {
  await page.getByTestId('desk-new-request').click();
  await page.waitForURL(/\/requests\/new/);
  await expect.poll(() => stepText(page)).toBe('Step 1 of 5: Kind of request');
  if (type) await page.getByTestId(`filing-type-${type}`).click();
}

/** Presses Next and waits for the step named (e.g. "Step 3 of 5: The departure"). */
export async function nextStep(page: Page, expected: string) {
  await page.getByTestId('filing-next').click();
  await expect.poll(() => stepText(page), { timeout: 10_000 }).toBe(expected);
}

export async function attachFile(page: Page, file: { name: string; mimeType: string; buffer: Buffer }) {
  const before = await page.getByTestId('filing-file').count();
  const chooser = page.waitForEvent('filechooser');
  await page.getByTestId('filing-add-files').click();
  await (await chooser).setFiles(file);
  await expect.poll(() => page.getByTestId('filing-file').count()).toBe(before + 1);
}

export const steps = {
  where: 'Step 2 of 5: What and where',
  departure: 'Step 3 of 5: The departure',
  files: 'Step 4 of 5: Drawings and photos',
  review: 'Step 5 of 5: Review and file',
};

// The demo's three-span deck, placed in one pour, as the engineering tests and the journey file it.
export async function fillDeckPlacement(page: Page) {
  await fillFields(page, {
    'filing-spans': '95, 120, 95',
    'filing-deck-width': '46',
    'filing-slab-thickness': '8.5',
    'filing-haunch': '0.12',
    'filing-planned-sequence': 'Five stages: positive-moment lengths first, then the pier lengths (sheet S-6).',
  });
  await page.getByTestId('filing-sequence-single_placement').click();
  await fillFields(page, {
    'filing-proposed-sequence': 'One placement from abutment 1 toward abutment 2.',
    'filing-placement-rate': '55',
    'filing-equipment': 'Two boom pumps, one finishing machine',
  });
}

export async function fillRetarder(page: Page) {
  await page.getByTestId('filing-retarder').click();
  await page.getByTestId('filing-retarder-type-D').click();
  await page.getByTestId('filing-retarder-product').fill('Type D retarder, trial batch TB-7');
  await page.getByTestId('filing-initial-set').fill('11.5');
}

// Why, what, when and at what cost, for the one-pour deck of fillDeckPlacement.
export async function fillDeckReasonAndSchedule(page: Page) {
  await fillFields(page, {
    'filing-reason': 'Two pumps are on hand for the whole day; one placement removes the joints over the piers.',
    'filing-proposed-change': 'Place the whole deck at once with Type D retarded concrete instead of the staged sequence.',
    'filing-needed-by': '2027-05-10',
  });
  await page.getByTestId('filing-cost-none').click();
  await page.getByTestId('filing-time-impact').fill('-5');
}
