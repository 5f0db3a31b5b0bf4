// A request returned for revision is revised in the filing form and resubmitted: the contractor
// reads the return comment, opens the form from the request, changes the reason, adds a photo,
// reads what changed, is refused without a comment, writes one and resubmits. The request then
// shows revision 2 at the section engineer's desk, and the server holds the photo on revision 2
// and the comment on the trail. The return itself is made through the API as the demo people.
import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ProjectSummary, RequestDetail } from '../../shared/requests/types';
import { launchChromium } from '../support/browser';
import { otherDeviationBody } from '../support/requestFixtures';
import { samplePhoto } from '../support/sampleFiles';
import { artifactsDir } from '../support/testSettings';
import { apiAs, type ApiPerson } from './apiPeople';
import { attachFile, nextStep, stepText, steps } from './filingSteps';
import { base, screenshotWhole, signInAs } from './helpers';

const shots = join(artifactsDir(), 'screenshots');
const phone = { width: 390, height: 844 };
const wide = { width: 1440, height: 900 };

let contractor: ApiPerson;
let sectionEngineer: ApiPerson;

// Filed on the demo bridge and returned by the section engineer with the comment given.
async function returnedRequest(title: string, comment: string): Promise<RequestDetail> {
  const projects = await contractor<ProjectSummary[]>('/api/projects');
  const project = projects.find((p) => p.code === 'PC-0114')!;
  let r = await contractor<RequestDetail>('/api/requests', { json: otherDeviationBody(project.id, title) });
  r = await contractor<RequestDetail>(`/api/requests/${r.id}/events`, { json: { type: 'submit', version: r.version } });
  r = await sectionEngineer<RequestDetail>(`/api/requests/${r.id}/events`, { json: { type: 'return_for_revision', version: r.version, comment } });
  expect(r).toMatchObject({ state: 'revising', currentRevision: 2 });
  return r;
}

async function openRequest(page: Page, id: string) {
  await page.goto(`${base}/requests/${id}`);
  await expect.poll(() => page.getByTestId('request-detail').count(), { timeout: 15_000 }).toBe(1);
}

describe('revising a returned request through the filing form', () => {
  let browser: Browser;
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true });
    browser = await launchChromium();
    contractor = await apiAs('contractor');
    sectionEngineer = await apiAs('section_engineer');
  });
  afterAll(async () => {
    await browser?.close();
  });

  it(`the contractor changes the reason, adds a photo and resubmits it as revision 2 (phone ${phone.width}×${phone.height})`, async () => {
    const tag = randomUUID().slice(0, 6);
    const returnComment = `Give the clearance to the pier cap step in the reason (${tag}).`;
    const r = await returnedRequest(`Relocate drain outlet at pier 2 (revise ${tag})`, returnComment);
    const context = await browser.newContext({ viewport: phone });
    const page = await context.newPage();
    const shot = (step: string) => screenshotWhole(page, phone, join(shots, `revise-phone-${step}.png`));

    await signInAs(page, 'contractor');
    await openRequest(page, r.id);
    expect(await page.getByTestId('request-state').textContent()).toBe('Returned for revision');
    await expect.poll(() => page.getByTestId('request-trail').textContent()).toContain(returnComment);
    // The bare move would send the unchanged body again; the panel keeps only the others.
    expect(await page.getByTestId('action-resubmit').count()).toBe(0);
    expect(await page.getByTestId('action-withdraw').count()).toBe(1);
    expect(await page.getByTestId('request-revise').textContent()).toBe('Revise the request');
    expect(await page.getByTestId('request-return-comment').textContent()).toContain(returnComment);
    await shot('1-returned');

    await page.getByTestId('request-revise').click();
    await page.waitForURL(new RegExp(`/requests/${r.id}/edit$`));
    await expect.poll(() => stepText(page), { timeout: 15_000 }).toBe('Step 1 of 5: Kind of request');
    expect(await page.getByTestId('edit-return-comment').textContent()).toContain(returnComment);
    // The kind is shown, not offered for change.
    expect(await page.locator('[data-testid^="filing-type-"]').count()).toBe(1);
    expect(await page.getByTestId('filing-type-other_deviation').count()).toBe(1);

    await nextStep(page, steps.where);
    expect(await page.getByTestId('filing-title').inputValue()).toBe(r.title);
    await nextStep(page, steps.departure);
    const reason = `The outlet as drawn lands on the pier cap step; moved 18 in it clears the step by 4 in (${tag}).`;
    await page.getByTestId('filing-reason').fill(reason);
    await nextStep(page, steps.files);
    const photo = { name: `DR-4 outlet at pier 2 ${tag}.jpg`, mimeType: 'image/jpeg', buffer: await samplePhoto(120, 90, '#6f7a83') };
    await attachFile(page, photo);
    await nextStep(page, 'Step 5 of 5: Review and file');

    const changes = page.getByTestId('filing-changes');
    expect(await changes.textContent()).toContain('What changed since revision 1');
    expect(await page.getByTestId('filing-change').count()).toBe(1);
    expect(await page.getByTestId('filing-change').textContent()).toContain(`Reason: ${otherDeviationBody('x').reason} → ${reason}`);
    expect(await page.getByTestId('filing-submit').textContent()).toBe('Resubmit as revision 2');

    // Not without saying what changed.
    await page.getByTestId('filing-submit').click();
    await expect.poll(() => page.getByText('Say why it is resubmitted, and what changed.').count()).toBeGreaterThan(0);
    expect(await page.getByTestId('filing-needs-attention').count()).toBe(1);
    expect(page.url()).toMatch(/\/edit$/);
    await shot('2-comment-refused');

    const comment = `Reason now gives the 4 in clearance to the pier cap step; outlet photo added (${tag}).`;
    await page.getByTestId('filing-resubmit-comment').fill(comment);
    await page.getByTestId('filing-submit').click();
    await page.waitForURL(new RegExp(`/requests/${r.id}$`), { timeout: 30_000 });
    await expect.poll(() => page.getByTestId('request-state').textContent(), { timeout: 15_000 }).toBe('With the section engineer');
    expect(await page.getByTestId('request-detail').textContent()).toContain('revision 2');
    expect(await page.getByTestId('request-revision-1').count()).toBe(1);
    expect(await page.getByTestId('request-revision-2').count()).toBe(1);
    expect(await page.getByTestId('request-reason').textContent()).toContain(reason);
    expect(await page.getByTestId('request-changes').textContent()).toContain('Changed since revision 1');
    expect(await page.getByTestId('request-changes').textContent()).toContain(reason);
    expect(await page.getByTestId('request-revise').count()).toBe(0);
    await shot('3-resubmitted');

    // The server's own account: the photo on revision 2, the comment on the resubmit.
    const after = await contractor<RequestDetail>(`/api/requests/${r.id}`);
    expect(after).toMatchObject({ state: 'section_review', currentRevision: 2 });
    expect(after.attachments.filter((a) => a.fileName === photo.name)).toMatchObject([{ revision: 2, purpose: 'revision', contentType: 'image/jpeg', sizeBytes: photo.buffer.length }]);
    const resubmits = after.trail.filter((e) => e.eventType === 'resubmit');
    expect(resubmits).toHaveLength(1);
    expect(resubmits[0]!.comment).toBe(comment);
    expect(after.revisions.find((v) => v.revision === 2)!.body.reason).toBe(reason);
    expect(after.revisions.find((v) => v.revision === 1)!.body.reason).toBe(otherDeviationBody('x').reason);
    await context.close();
  });

  it(`a draft is carried on from its page, kept on the device across a reload, and filed (phone ${phone.width}×${phone.height})`, async () => {
    const tag = randomUUID().slice(0, 6);
    const projects = await contractor<ProjectSummary[]>('/api/projects');
    const project = projects.find((p) => p.code === 'PC-0114')!;
    const r = await contractor<RequestDetail>('/api/requests', { json: otherDeviationBody(project.id, `Relocate drain outlet at pier 1 (draft ${tag})`) });
    const context = await browser.newContext({ viewport: phone });
    const page = await context.newPage();
    const keptKeys = () => page.evaluate<string[]>(`Object.keys(localStorage).filter((k) => k.endsWith('.request-${r.id}'))`);

    await signInAs(page, 'contractor');
    await openRequest(page, r.id);
    expect(await page.getByTestId('request-state').textContent()).toBe('Drafting');
    expect(await page.getByTestId('action-submit').count()).toBe(0);
    expect(await page.getByTestId('request-revise').textContent()).toBe('Continue the draft');
    await page.getByTestId('request-revise').click();
    await page.waitForURL(new RegExp(`/requests/${r.id}/edit$`));
    expect(await page.getByTestId('edit-title').textContent()).toBe('Continue the draft');
    await expect.poll(() => stepText(page), { timeout: 15_000 }).toBe('Step 1 of 5: Kind of request');
    await nextStep(page, steps.where);
    const title = `Relocate drain outlet DR-1 at pier 1 (draft ${tag})`;
    await page.getByTestId('filing-title').fill(title);
    await expect.poll(keptKeys, { timeout: 5_000 }).toHaveLength(1);

    // The typing survives a reload, on the step it was left at, and says it is not on Spanrelay yet.
    await page.reload();
    await expect.poll(() => stepText(page), { timeout: 15_000 }).toBe(steps.where);
    expect(await page.getByTestId('filing-title').inputValue()).toBe(title);
    expect(await page.getByTestId('draft-notice').textContent()).toContain('not saved to Spanrelay yet');

    await nextStep(page, steps.departure);
    await nextStep(page, steps.files);
    await nextStep(page, steps.review);
    expect(await page.getByTestId('filing-resubmit-comment').count()).toBe(0);
    expect(await page.getByTestId('filing-submit').textContent()).toBe('File the request');
    await page.getByTestId('filing-submit').click();
    await page.waitForURL(new RegExp(`/requests/${r.id}\\?filed=1$`), { timeout: 30_000 });
    await expect.poll(() => page.getByTestId('request-filed').count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByTestId('request-state').textContent()).toBe('With the section engineer');
    expect(await keptKeys()).toEqual([]);
    const after = await contractor<RequestDetail>(`/api/requests/${r.id}`);
    expect(after).toMatchObject({ state: 'section_review', title, currentRevision: 1 });
    expect(after.trail.map((e) => e.eventType)).toEqual(['created', 'submit']);
    await context.close();
  });

  it(`the edit form on a wide screen saves the revision, reloads it when changed elsewhere; someone else is told it is not theirs (${wide.width}×${wide.height})`, async () => {
    const tag = randomUUID().slice(0, 6);
    const returned = await returnedRequest(`Relocate drain outlet at pier 3 (revise wide ${tag})`, `Add the downspout bracket spacing (${tag}).`);
    // A file already stored with revision 2 (from an earlier try whose resubmit did not go through).
    const form = new FormData();
    const stored = `Bracket spacing sketch ${tag}.jpg`;
    form.append('files', new Blob([new Uint8Array(await samplePhoto(80, 60, '#5d6b4f'))], { type: 'image/jpeg' }), stored);
    await contractor(`/api/requests/${returned.id}/attachments?purpose=revision`, { body: form });
    const r = await contractor<RequestDetail>(`/api/requests/${returned.id}`);
    const context = await browser.newContext({ viewport: wide });
    const page = await context.newPage();

    await signInAs(page, 'contractor');
    await page.goto(`${base}/requests/${r.id}/edit`);
    await expect.poll(() => stepText(page), { timeout: 15_000 }).toBe('Step 1 of 5: Kind of request');
    await nextStep(page, steps.where);
    await nextStep(page, steps.departure);
    await nextStep(page, steps.files);
    // Revision 1's files stay with it; revision 2's own are listed as stored, not to be sent again.
    expect(await page.getByTestId('filing-stored-file').count()).toBe(1);
    expect(await page.getByTestId('filing-stored-file').textContent()).toContain(`${stored}`);
    expect(await page.getByTestId('filing-stored-file').textContent()).toContain('On revision 2');
    expect(await page.getByTestId('filing-file').count()).toBe(0);
    await page.getByTestId('filing-back').click();
    await expect.poll(() => stepText(page)).toBe(steps.departure);
    const proposed = `Move the outlet 18 in toward span 3; brackets at 4 ft on centres (${tag}).`;
    await page.getByTestId('filing-proposed-change').fill(proposed);
    await page.getByTestId('filing-save-draft').click();
    await expect.poll(() => page.getByTestId('draft-notice').textContent(), { timeout: 10_000 }).toBe(`Revision 2 saved to Spanrelay as ${r.number}.`);
    await screenshotWhole(page, wide, join(shots, 'revise-wide-edit-form.png'));

    // Saved to revision 2, still at the contractor's desk.
    const saved = await contractor<RequestDetail>(`/api/requests/${r.id}`);
    expect(saved).toMatchObject({ state: 'revising', currentRevision: 2, version: r.version + 1 });
    expect(saved.revisions.find((v) => v.revision === 2)!.body.proposedChange).toBe(proposed);

    // Changed elsewhere in between: the next save is refused, and the form reloads and says so.
    const elsewhere = `Move the outlet 20 in toward span 3 (changed elsewhere ${tag}).`;
    await contractor<RequestDetail>(`/api/requests/${r.id}/draft`, {
      method: 'PUT',
      json: { version: saved.version, body: { ...saved.revisions.find((v) => v.revision === 2)!.body, proposedChange: elsewhere } },
    });
    await page.getByTestId('filing-reason').fill(`The outlet lands on the pier cap step (${tag}).`);
    await page.getByTestId('filing-save-draft').click();
    await expect.poll(() => page.getByTestId('draft-notice').textContent(), { timeout: 10_000 }).toContain('Someone changed this request on Spanrelay since you opened it');
    await expect.poll(() => page.getByTestId('filing-proposed-change').inputValue()).toBe(elsewhere);
    expect((await contractor<RequestDetail>(`/api/requests/${r.id}`)).revisions.find((v) => v.revision === 2)!.body.proposedChange).toBe(elsewhere);
    await context.close();

    const other = await browser.newContext({ viewport: wide });
    const reviewer = await other.newPage();
    await signInAs(reviewer, 'section_engineer');
    await reviewer.goto(`${base}/requests/${r.id}/edit`);
    await expect.poll(() => reviewer.getByTestId('edit-not-allowed').count(), { timeout: 15_000 }).toBe(1);
    expect(await reviewer.getByTestId('edit-not-allowed').textContent()).toContain('who filed it, can change this request');
    expect(await reviewer.getByTestId('filing-step').count()).toBe(0);
    await reviewer.getByTestId('edit-back').click();
    await reviewer.waitForURL(new RegExp(`/requests/${r.id}$`));
    await other.close();
  });
});
