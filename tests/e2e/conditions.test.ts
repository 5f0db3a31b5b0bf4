// The field inspector confirms conditions on site through the web app: a note, a photo sent with
// its progress bar, the condition shown met with its thumbnail; a condition someone else settles
// first is reported, not overwritten. The request with conditions is made through the API as the
// demo people, the way their own screens would.
import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoEmail } from '../../server/demo/demoScenario';
import type { ConditionList } from '../../shared/conditions/types';
import type { ProjectSummary, RequestDetail } from '../../shared/requests/types';
import { launchChromium } from '../support/browser';
import { otherDeviationBody } from '../support/requestFixtures';
import { samplePhoto } from '../support/sampleFiles';
import { artifactsDir } from '../support/testSettings';
import { apiAs, type ApiPerson } from './apiPeople';
import { base, screenshotWhole, signInAs } from './helpers';

const shots = join(artifactsDir(), 'screenshots');
const phone = { width: 390, height: 844 };
const wide = { width: 1440, height: 900 };

type Api = ApiPerson;
let people: Record<'contractor' | 'section_engineer' | 'central_office' | 'engineer_of_record' | 'field_inspector', Api>;

// Files a request on the demo bridge and walks it to the engineer of record's approval with the
// conditions given; answers the request as it then stands.
async function approvedWithConditions(title: string, conditions: { text: string; dueBefore: string }[]): Promise<RequestDetail> {
  const projects = await people.contractor<ProjectSummary[]>('/api/projects');
  const project = projects.find((p) => p.code === 'PC-0114')!;
  let r = await people.contractor<RequestDetail>('/api/requests', { json: otherDeviationBody(project.id, title) });
  const move = async (who: Api, event: Record<string, unknown>) => {
    r = await who<RequestDetail>(`/api/requests/${r.id}/events`, { json: { version: r.version, ...event } });
  };
  await move(people.contractor, { type: 'submit' });
  await move(people.section_engineer, { type: 'forward' });
  const eors = await people.central_office<{ id: string; email: string }[]>(`/api/requests/${r.id}/engineers-of-record`);
  await move(people.central_office, { type: 'route', eorUserId: eors.find((e) => e.email === demoEmail('engineer_of_record'))!.id });
  await move(people.engineer_of_record, { type: 'approve_with_conditions', conditions, comment: 'Approved with the conditions listed.' });
  expect(r.state).toBe('conditions_open');
  return r;
}

// The field inspector's own move over the API: evidence first, then the condition.
async function satisfyOverApi(r: RequestDetail, conditionId: string, note: string, fileName: string) {
  const form = new FormData();
  form.append('files', new Blob([new Uint8Array(await samplePhoto(96, 72, '#7d8a6a'))], { type: 'image/jpeg' }), fileName);
  const [evidence] = await people.field_inspector<{ id: string }[]>(`/api/requests/${r.id}/attachments?purpose=condition_evidence`, { body: form });
  const current = await people.field_inspector<RequestDetail>(`/api/requests/${r.id}`);
  return people.field_inspector<RequestDetail>(`/api/requests/${r.id}/events`, {
    json: { type: 'satisfy_condition', version: current.version, conditionId, comment: note, evidenceAttachmentId: evidence!.id },
  });
}

async function openConditionsScreen(page: Page) {
  await page.goto(`${base}/conditions`);
  await expect.poll(() => page.getByTestId('conditions-list').count(), { timeout: 15_000 }).toBe(1);
}

const requestGroup = (page: Page, number: string) => page.getByTestId('condition-request').filter({ hasText: number });

describe('conditions on site through the web app', () => {
  let browser: Browser;
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    browser = await launchChromium();
    people = {
      contractor: await apiAs('contractor'),
      section_engineer: await apiAs('section_engineer'),
      central_office: await apiAs('central_office'),
      engineer_of_record: await apiAs('engineer_of_record'),
      field_inspector: await apiAs('field_inspector'),
    };
  });
  afterAll(async () => {
    await browser?.close();
  });

  it(`the field inspector marks a condition satisfied with a note and a photo (phone ${phone.width}×${phone.height})`, async () => {
    const tag = randomUUID().slice(0, 6);
    const r = await approvedWithConditions(`Relocate drain outlet at pier 2 (conditions ${tag})`, [
      { text: `Downspout bracket anchors proof-loaded before the deck drains are connected (${tag})`, dueBefore: 'before the drains are connected' },
      { text: `Outlet position checked against sheet D-3 after the extension is fitted (${tag})`, dueBefore: 'before final inspection' },
    ]);
    const context = await browser.newContext({ viewport: phone });
    const page = await context.newPage();
    const shot = (step: string) => screenshotWhole(page, phone, join(shots, `conditions-phone-${step}.png`));

    await signInAs(page, 'field_inspector');
    await openConditionsScreen(page);
    const group = requestGroup(page, r.number);
    await expect.poll(() => group.count()).toBe(1);
    expect(await group.textContent()).toContain('Approved with conditions by Ruth Caldera, P.E.');
    const [first, second] = [group.getByTestId('condition-card').nth(0), group.getByTestId('condition-card').nth(1)];
    expect(await first.textContent()).toContain('Downspout bracket anchors proof-loaded');
    expect(await first.getByTestId('condition-status').textContent()).toBe('Open');
    await shot('1-open');

    // Nothing is sent without a note and a file; each says so in place.
    await first.getByTestId('condition-satisfy').click();
    await first.getByTestId('condition-note').fill('ok');
    await first.getByTestId('condition-submit').click();
    await expect.poll(() => first.getByText('Note how the condition was met on site.').count()).toBe(1);
    expect(await first.getByText('Choose a photo or document that shows the condition met.').count()).toBe(1);
    await shot('2-refused');

    const note = 'Four anchors proof-loaded to 1.5 kips each at 07:40; none moved. Bracket plumb.';
    await first.getByTestId('condition-note').fill(note);
    expect(await first.getByText('Note how the condition was met on site.').count()).toBe(0);
    const chooser = page.waitForEvent('filechooser');
    await first.getByTestId('condition-evidence').click();
    await (await chooser).setFiles({ name: 'bracket anchors proof load.jpg', mimeType: 'image/jpeg', buffer: await samplePhoto(320, 240, '#6b7378') });
    await expect.poll(() => first.getByTestId('condition-evidence-file').textContent()).toContain('bracket anchors proof load.jpg');
    await shot('3-filled');
    await first.getByTestId('condition-submit').click();

    // Met, with who, the note and the photo's thumbnail from the server's preview.
    await expect.poll(() => first.getByTestId('condition-status').textContent(), { timeout: 15_000 }).toBe('Met');
    expect(await first.getByTestId('condition-notice').textContent()).toContain('Marked satisfied');
    expect(await first.getByTestId('condition-met').textContent()).toContain('Confirmed by Tomas Reyl');
    expect(await first.getByTestId('condition-met-note').textContent()).toContain(note);
    const thumb = first.getByTestId('attachment-preview');
    await expect.poll(() => thumb.count()).toBe(1);
    await expect.poll(() => first.locator('img').evaluate((img) => (img as unknown as { naturalWidth: number }).naturalWidth)).toBeGreaterThan(0);
    expect(await second.getByTestId('condition-status').textContent()).toBe('Open');
    await shot('4-met');

    // The server holds it: the condition satisfied by the demo field inspector, on evidence of the right kind.
    const after = await people.field_inspector<RequestDetail>(`/api/requests/${r.id}`);
    const met = after.conditions.find((c) => c.seq === 1)!;
    expect(met).toMatchObject({ satisfied: true, note, satisfiedBy: { name: 'Tomas Reyl' } });
    expect(after.attachments.find((a) => a.id === met.evidenceAttachmentId)).toMatchObject({ purpose: 'condition_evidence', fileName: 'bracket anchors proof load.jpg', contentType: 'image/jpeg' });
    expect(after.state).toBe('conditions_open');

    // Someone else settles the last condition while the form is being filled: the person is told,
    // and nothing of theirs overwrites it.
    await second.getByTestId('condition-satisfy').click();
    await second.getByTestId('condition-note').fill('Outlet measured 18 in toward span 3 from the pier cap step, as on D-3.');
    const chooser2 = page.waitForEvent('filechooser');
    await second.getByTestId('condition-evidence').click();
    await (await chooser2).setFiles({ name: 'outlet position.jpg', mimeType: 'image/jpeg', buffer: await samplePhoto(200, 150, '#5d6a72') });
    const other = await satisfyOverApi(after, after.conditions.find((c) => c.seq === 2)!.id, 'Checked from the deck during the walk-through.', 'walkthrough.jpg');
    expect(other.state).toBe('closed');
    await second.getByTestId('condition-submit').click();
    await expect.poll(() => second.getByTestId('condition-notice').textContent(), { timeout: 15_000 }).toContain('marked this condition satisfied while you were working');
    expect(await second.getByTestId('condition-status').textContent()).toBe('Met');
    expect(await second.getByTestId('condition-met-note').textContent()).toContain('Checked from the deck during the walk-through.');
    const closed = await people.field_inspector<RequestDetail>(`/api/requests/${r.id}`);
    expect(closed.state).toBe('closed');
    expect(closed.conditions.find((c) => c.seq === 2)!.note).toBe('Checked from the deck during the walk-through.');
    await shot('5-settled-by-someone-else');

    // The way to the request itself.
    await group.getByTestId('condition-request-link').click();
    await page.waitForURL(new RegExp(`/requests/${r.id}$`));
    await expect.poll(() => page.getByTestId('request-state').textContent()).toBe('Closed (approved)');
    await context.close();
  });

  it(`shows open and recently met conditions by request (wide ${wide.width}×${wide.height})`, async () => {
    const tag = randomUUID().slice(0, 6);
    const r = await approvedWithConditions(`Relocate drain outlet at pier 2 (wide ${tag})`, [
      { text: `Trial fit of the extended downspout witnessed by the inspector (${tag})`, dueBefore: 'before fabrication of the remaining downspouts' },
      { text: `Pier cap coating repaired where the old bracket was removed (${tag})`, dueBefore: 'before final inspection' },
    ]);
    await satisfyOverApi(r, r.conditions[0]!.id, 'Trial fit witnessed; clearance to the cap step 2 in.', 'trial fit.jpg');
    const open = await people.field_inspector<ConditionList>('/api/conditions');
    expect(open.items.filter((i) => i.request.id === r.id).map((i) => i.condition.seq)).toEqual([2]);

    const context = await browser.newContext({ viewport: wide });
    const page = await context.newPage();
    await signInAs(page, 'field_inspector');
    await openConditionsScreen(page);
    const group = requestGroup(page, r.number);
    await expect.poll(() => group.getByTestId('condition-card').count()).toBe(1);
    await screenshotWhole(page, wide, join(shots, 'conditions-wide-1-open.png'));

    await page.getByTestId('conditions-show-all').click();
    await expect.poll(() => group.getByTestId('condition-card').count()).toBe(2);
    const metCard = group.getByTestId('condition-card').nth(0);
    expect(await metCard.getByTestId('condition-status').textContent()).toBe('Met');
    expect(await metCard.getByTestId('condition-met-note').textContent()).toContain('Trial fit witnessed');
    await expect.poll(() => metCard.getByTestId('attachment-preview').count()).toBe(1);
    await screenshotWhole(page, wide, join(shots, 'conditions-wide-2-all.png'));
    await context.close();
  });
});
