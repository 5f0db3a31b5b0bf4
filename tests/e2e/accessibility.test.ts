// Every main screen of every desk, on a phone and on a wide screen, checked as a keyboard and
// screen-reader user meets it: each visible control has a name and a target of at least 44×44 CSS
// px (WCAG 2.2: 4.1.2 Name, Role, Value; 2.5.8 Target Size, held here to the 44 px the product
// asks for), Tab reaches every control in reading order with a focus ring that stands out from
// what surrounds it (2.1.1 Keyboard, 2.4.3 Focus Order, 2.4.7 Focus Visible, 1.4.11 Non-text
// Contrast at 3:1), Enter and Space work (sign in and open a request without a mouse), and no
// script error shows up on the way.
//
// Where the navigation sits in the tab order, by decision: on a wide screen the side navigation
// comes first (it is first on the page, left of the content); on a phone the slim top bar (sign
// out) comes first, then the page, then the bottom tabs last, in the order they are seen from top
// to bottom.
//
// A failure lists every problem found on every screen of that desk, as "screen: control: what".
import { appendFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoEmail, demoPassword } from '../../server/demo/demoScenario';
import { roleLabels, type Role } from '../../shared/roles';
import type { RequestPage } from '../../shared/requests/types';
import { launchChromium } from '../support/browser';
import { artifactsDir } from '../support/testSettings';
import { base } from './helpers';

const controlsLog = join(artifactsDir(), 'accessibility-controls.txt');

const viewports = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1440, height: 900 },
] as const;
type Viewport = (typeof viewports)[number];

type Control = { idx: number; what: string; name: string; width: number; height: number; inNav: boolean; inlineInText: boolean; disabled: boolean; linkWithoutAddress: boolean; stateUnsaid: boolean };
type Stop = { idx: number | null; what: string; inNav: boolean; ring: string | null };

// Runs in the page (a string: these tests are checked without the DOM's types). Marks each visible
// control with data-a11y-idx so the Tab walk can tell which one holds focus.
const collectControls = `(() => {
  const selector = 'a[href], button, input:not([type=hidden]), select, textarea, [role=button], [role=link], [role=radio], [role=checkbox], [role=tab], [role=switch], [role=textbox], [role=combobox], [tabindex]:not([tabindex="-1"])';
  const nameOf = (el) => {
    const aria = el.getAttribute('aria-label');
    if (aria && aria.trim()) return aria.trim();
    const by = el.getAttribute('aria-labelledby');
    if (by) {
      const t = by.split(/\\s+/).map((id) => document.getElementById(id)?.textContent ?? '').join(' ').trim();
      if (t) return t;
    }
    if (el.labels && el.labels.length) return Array.from(el.labels).map((l) => l.textContent).join(' ').trim();
    if (['INPUT', 'TEXTAREA', 'SELECT'].includes(el.tagName)) return (el.getAttribute('title') ?? '').trim();
    return (el.textContent ?? '').trim();
  };
  const out = [];
  let idx = 0;
  for (const el of document.querySelectorAll(selector)) {
    const r = el.getBoundingClientRect();
    const cs = getComputedStyle(el);
    if (r.width === 0 || r.height === 0 || cs.visibility === 'hidden' || el.closest('[aria-hidden="true"]')) continue;
    el.setAttribute('data-a11y-idx', String(idx));
    const implicit = { A: 'link', BUTTON: 'button', TEXTAREA: 'textbox', SELECT: 'combobox', INPUT: 'textbox' };
    const role = el.getAttribute('role') ?? implicit[el.tagName] ?? el.tagName.toLowerCase();
    const testId = el.getAttribute('data-testid');
    const name = nameOf(el);
    // A link that is one phrase of a sentence: its parent holds more words than the link does.
    const parent = el.parentElement;
    const inlineInText = role === 'link' && cs.display === 'inline' && !!parent && (parent.textContent ?? '').trim().length > (el.textContent ?? '').trim().length;
    out.push({
      idx,
      what: role + (testId ? ' [' + testId + ']' : '') + (name ? ' "' + name.slice(0, 60) + '"' : ''),
      name,
      width: Math.round(r.width * 10) / 10,
      height: Math.round(r.height * 10) / 10,
      inNav: !!el.closest('[data-testid="nav-side"], [data-testid="nav-tabs"], [data-testid="shell-bar"]'),
      inlineInText,
      disabled: el.getAttribute('aria-disabled') === 'true' || el.disabled === true,
      linkWithoutAddress: role === 'link' && !(el.tagName === 'A' && el.getAttribute('href')),
      stateUnsaid: ['radio', 'checkbox', 'switch'].includes(role) && !['true', 'false', 'mixed'].includes(el.getAttribute('aria-checked') ?? ''),
    });
    idx++;
  }
  return out;
})()`;

// The focused element and whether its ring shows: an outline (or an outline-like box shadow) of a
// colour at least 3:1 against the background right around the control.
const describeFocus = `(() => {
  const el = document.activeElement;
  if (!el || el === document.body) return null;
  const lum = (rgb) => {
    const c = rgb.map((v) => v / 255).map((v) => (v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4)));
    return 0.2126 * c[0] + 0.7152 * c[1] + 0.0722 * c[2];
  };
  const parse = (s) => {
    const m = s.match(/rgba?\\(([^)]+)\\)/);
    if (!m) return null;
    const p = m[1].split(/[ ,/]+/).filter(Boolean).map(Number);
    return { rgb: p.slice(0, 3), alpha: p.length > 3 ? p[3] : 1 };
  };
  const backgroundAround = (node) => {
    for (let n = node.parentElement; n; n = n.parentElement) {
      const c = parse(getComputedStyle(n).backgroundColor);
      if (c && c.alpha > 0.5) return c.rgb;
    }
    return [255, 255, 255];
  };
  const ratio = (a, b) => {
    const [hi, lo] = [lum(a), lum(b)].sort((x, y) => y - x);
    return (hi + 0.05) / (lo + 0.05);
  };
  const cs = getComputedStyle(el);
  const testId = el.getAttribute('data-testid');
  const idx = el.getAttribute('data-a11y-idx');
  const what = (el.getAttribute('role') ?? el.tagName.toLowerCase()) + (testId ? ' [' + testId + ']' : '') + ' "' + (el.getAttribute('aria-label') ?? el.textContent ?? '').trim().slice(0, 60) + '"';
  const inNav = !!el.closest('[data-testid="nav-side"], [data-testid="nav-tabs"], [data-testid="shell-bar"]');
  let ring = null;
  const outline = parse(cs.outlineColor);
  const width = parseFloat(cs.outlineWidth) || 0;
  if (cs.outlineStyle === 'none' || width < 2 || !outline || outline.alpha < 0.5) {
    ring = 'no focus ring (outline ' + cs.outlineStyle + ' ' + cs.outlineWidth + ' ' + cs.outlineColor + ')';
  } else {
    const around = backgroundAround(el);
    const r = ratio(outline.rgb, around);
    if (r < 3) ring = 'focus ring ' + cs.outlineColor + ' is ' + r.toFixed(2) + ':1 against rgb(' + around.join(',') + '), under 3:1';
  }
  return { idx: idx === null ? null : Number(idx), what, inNav, ring };
})()`;

type Watch = { errors: string[] };

function watch(page: Page): Watch {
  const w: Watch = { errors: [] };
  page.on('pageerror', (e) => w.errors.push(`page error at ${page.url()}: ${e.message}`));
  page.on('console', (m) => {
    if (m.type() !== 'error') return;
    // Who is signed in is asked on every start; before sign-in the answer is 401 by design.
    if (/status of 401/.test(m.text()) && /\/api\/me$/.test(m.location().url ?? '')) return;
    // An invitation link with a made-up token is looked up and refused (404) by design; the
    // screen says so, the browser logs the answer.
    if (/status of 404/.test(m.text()) && /token=not-a-real-token/.test(page.url()) && /\/api\/invitations\/preview/.test(m.location().url ?? '')) return;
    w.errors.push(`console error at ${page.url()}: ${m.text()} (${m.location().url ?? ''})`);
  });
  return w;
}

// Waits until the screen has loaded: no request in flight, no spinner left, and the same number
// of controls drawn twice running.
async function settled(page: Page) {
  await page.waitForLoadState('networkidle');
  await expect.poll(() => page.locator('[role="progressbar"]').count(), { timeout: 15_000 }).toBe(0);
  let last = -1;
  for (let i = 0; i < 40; i++) {
    const now = await page.locator('a[href], button, input, textarea, [role=button], [role=link], [role=radio]').count();
    if (now > 0 && now === last) return;
    last = now;
    await page.waitForTimeout(200);
  }
}

// Names and sizes of every visible control.
async function auditControls(page: Page, screen: string, problems: string[]): Promise<Control[]> {
  const controls = await page.evaluate<Control[]>(collectControls);
  // Kept for whoever reads a failure: every control seen, with its name and size.
  appendFileSync(controlsLog, `${screen}\n${controls.map((c) => `  ${c.what} ${c.width}×${c.height}${c.inlineInText ? ' (inline)' : ''}`).join('\n')}\n`);
  if (controls.length === 0) problems.push(`${screen}: no controls found at all`);
  for (const c of controls) {
    if (!c.name) problems.push(`${screen}: ${c.what}: no accessible name`);
    if (c.stateUnsaid) problems.push(`${screen}: ${c.what}: does not say whether it is checked (no aria-checked)`);
    // react-native-web leaves Enter on a link to the browser, which does nothing without an address.
    if (c.linkWithoutAddress) problems.push(`${screen}: ${c.what}: a link with no address, so Enter does nothing (make it a button or give it an href)`);
    // WCAG 2.5.8's inline exception: a link inside a sentence may be as tall as the line it sits in.
    if (c.inlineInText) continue;
    if (c.width < 44 || c.height < 44) problems.push(`${screen}: ${c.what}: target ${c.width}×${c.height} px, under 44×44`);
  }
  return controls;
}

// Puts the keyboard back at the top of the page, as on a fresh load: focus a throwaway element
// placed first in the body, so the next Tab goes to the first control.
async function focusTop(page: Page) {
  await page.evaluate(`(() => {
    const top = document.createElement('div');
    top.tabIndex = -1;
    top.setAttribute('data-a11y-top', '');
    document.body.prepend(top);
    top.focus();
    top.addEventListener('blur', () => top.remove(), { once: true });
  })()`);
}

// Presses Tab from the top of the screen until focus comes round again.
async function tabWalk(page: Page, screen: string, controls: Control[], vp: Viewport, problems: string[]): Promise<Stop[]> {
  await focusTop(page);
  const stops: Stop[] = [];
  const seen = new Set<number>();
  for (let i = 0; i < 150; i++) {
    await page.keyboard.press('Tab');
    const stop = await page.evaluate<Stop | null>(describeFocus);
    if (!stop) {
      if (stops.length) break;
      continue;
    }
    if (stop.idx !== null && seen.has(stop.idx)) break;
    if (stop.idx !== null) seen.add(stop.idx);
    stops.push(stop);
    if (stop.ring) problems.push(`${screen}: ${stop.what}: ${stop.ring}`);
    if (stop.idx === null) problems.push(`${screen}: ${stop.what}: takes focus but is not seen as a control (no role or not visible)`);
  }
  for (const c of controls) {
    if (!c.disabled && !seen.has(c.idx)) problems.push(`${screen}: ${c.what}: never reached with Tab`);
  }
  // Reading order: each stop further down (or, in a row, further right) than the one before,
  // checked within the page's content only, where order mistakes hide.
  const content = stops.filter((s) => !s.inNav);
  const navAt = stops.map((s, i) => (s.inNav ? i : -1)).filter((i) => i >= 0);
  const contentAt = stops.map((s, i) => (!s.inNav ? i : -1)).filter((i) => i >= 0);
  if (navAt.length && contentAt.length) {
    if (vp.name === 'wide' && Math.max(...navAt) > Math.min(...contentAt)) {
      problems.push(`${screen}: the side navigation is not all before the page's content in the tab order`);
    }
    if (vp.name === 'phone') {
      const tabsAt = stops.map((s, i) => (s.inNav && /\[nav-/.test(s.what) ? i : -1)).filter((i) => i >= 0);
      if (tabsAt.length && Math.min(...tabsAt) < Math.max(...contentAt)) problems.push(`${screen}: the bottom tabs are not after the page's content in the tab order`);
    }
  }
  if (content.length === 0 && controls.some((c) => !c.inNav)) problems.push(`${screen}: Tab never reaches the page's content`);
  return stops;
}

// A radio or a checkbox answers Space, the key a keyboard user tries first on one.
async function spaceToggles(page: Page, screen: string, problems: string[]) {
  for (const role of ['radio', 'checkbox']) {
    const target = page.locator(`[role="${role}"][aria-checked="false"]:visible`).first();
    if ((await target.count()) === 0) continue;
    const testId = await target.getAttribute('data-testid');
    const handle = await target.elementHandle();
    const what = `${role} [${testId ?? ''}] "${(await target.getAttribute('aria-label')) ?? ''}"`;
    await target.focus();
    await page.keyboard.press('Space');
    await page.waitForTimeout(150);
    // The same control, found again by its test id if the screen drew it anew.
    const now = testId ? await page.getByTestId(testId).first().getAttribute('aria-checked') : await handle?.getAttribute('aria-checked');
    if (now !== 'true') problems.push(`${screen}: ${what}: Space did not check it`);
  }
}

async function checkScreen(page: Page, screen: string, vp: Viewport, problems: string[]) {
  await settled(page);
  const controls = await auditControls(page, screen, problems);
  await tabWalk(page, screen, controls, vp, problems);
  await spaceToggles(page, screen, problems);
}

// Presses Tab until the control with this test id has focus; fails if it never does.
async function tabTo(page: Page, testId: string, max = 80) {
  await focusTop(page);
  for (let i = 0; i < max; i++) {
    await page.keyboard.press('Tab');
    const at = await page.evaluate<string | null>(`document.activeElement?.getAttribute('data-testid') ?? null`);
    if (at === testId) return;
  }
  throw new Error(`Tab never reached [${testId}] at ${page.url()}`);
}

async function signInByKeyboard(page: Page, role: Role, problems: string[], vp: Viewport) {
  await page.goto(`${base}/sign-in`);
  await page.waitForURL(/\/sign-in/);
  await checkScreen(page, `sign-in (${vp.name})`, vp, problems);
  await page.goto(`${base}/sign-in`);
  await settled(page);
  await tabTo(page, 'sign-in-email');
  await page.keyboard.type(demoEmail(role));
  await tabTo(page, 'sign-in-password');
  await page.keyboard.type(demoPassword);
  await tabTo(page, 'sign-in-submit');
  await page.keyboard.press(role.length % 2 ? 'Enter' : 'Space');
  await expect.poll(() => page.getByTestId('shell-actor').textContent(), { timeout: 15_000 }).toContain(roleLabels[role]);
}

async function someRequestId(page: Page, mine: boolean): Promise<string> {
  const res = await page.request.get(`${base}/api/requests${mine ? '?desk=mine' : ''}`);
  expect(res.ok()).toBe(true);
  const body = (await res.json()) as RequestPage;
  if (body.items[0]) return body.items[0].id;
  const all = (await (await page.request.get(`${base}/api/requests`)).json()) as RequestPage;
  expect(all.items.length).toBeGreaterThan(0);
  return all.items[0]!.id;
}

// Opens the first request on the desk from the keyboard: a page of its own on a phone, the pane
// beside the list on a wide screen.
async function openRequestByKeyboard(page: Page, vp: Viewport) {
  await page.goto(`${base}/`);
  await settled(page);
  await tabTo(page, 'request-card');
  await page.keyboard.press('Enter');
  if (vp.name === 'wide') {
    await page.waitForURL(/[?&]selected=[0-9a-f-]{36}/);
  } else {
    await page.waitForURL(/\/requests\/[0-9a-f-]{36}$/);
  }
  await expect.poll(() => page.getByTestId('request-detail').count(), { timeout: 15_000 }).toBe(1);
}

// The screens each desk reaches from its navigation, plus the request it works on.
const screensOf: Record<Role, { path: string; name: string; opens?: string[] }[]> = {
  contractor: [
    { path: '/', name: 'My desk' },
    { path: '/register', name: 'Register', opens: ['register-filters-toggle'] },
  ],
  section_engineer: [
    { path: '/', name: 'My desk' },
    { path: '/register', name: 'Register', opens: ['register-filters-toggle'] },
  ],
  central_office: [
    { path: '/', name: 'My desk' },
    { path: '/register', name: 'Register', opens: ['register-filters-toggle'] },
  ],
  engineer_of_record: [
    { path: '/', name: 'My desk' },
    { path: '/register', name: 'Register', opens: ['register-filters-toggle'] },
  ],
  field_inspector: [
    { path: '/', name: 'My desk' },
    { path: '/register', name: 'Register', opens: ['register-filters-toggle'] },
  ],
  auditor: [
    { path: '/trail', name: 'Trail search', opens: ['trail-search-toggle'] },
    { path: '/register', name: 'Register', opens: ['register-filters-toggle'] },
  ],
  admin: [
    { path: '/people', name: 'People', opens: ['invite-open', 'person-edit-contractor@demo.spanrelay.test'] },
    { path: '/people/projects', name: 'Projects' },
    { path: '/register', name: 'Register', opens: ['register-filters-toggle'] },
  ],
};
const deskHolders: Role[] = ['contractor', 'section_engineer', 'central_office', 'engineer_of_record', 'field_inspector'];

function report(problems: string[], errors: string[]) {
  const all = [...problems, ...errors];
  expect(all, `accessibility problems:\n  ${all.join('\n  ')}\n`).toEqual([]);
}

describe('accessibility of every main screen', () => {
  let browser: Browser;
  beforeAll(async () => {
    mkdirSync(artifactsDir(), { recursive: true });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
  });

  // The checks themselves, on a page made to break each rule once: a test that cannot fail is no test.
  it('catches a nameless small control, a link with no address, an unsaid state and a missing focus ring', async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 844 } });
    await page.setContent(`<body style="background:#F3F1EC">
      <div role="button" tabindex="0" data-testid="tiny" style="width:20px;height:20px"></div>
      <div role="link" tabindex="0" data-testid="no-address" style="height:48px">Open it</div>
      <div role="radio" tabindex="0" data-testid="unsaid" style="height:48px">Pick me</div>
      <p>Read <a href="#terms" data-testid="inline">the terms</a> first.</p>
    </body>`);
    const problems: string[] = [];
    const controls = await auditControls(page, 'made-up', problems);
    await tabWalk(page, 'made-up', controls, viewports[0], problems);
    const said = problems.join('\n');
    expect(said).toContain('[tiny]: no accessible name');
    expect(said).toContain('[tiny]: target 20×20 px, under 44×44');
    expect(said).toContain('[no-address] "Open it": a link with no address');
    expect(said).toContain('[unsaid] "Pick me": does not say whether it is checked');
    expect(said).toMatch(/\[tiny\].*: no focus ring/);
    // WCAG 2.5.8's inline exception: the link inside the sentence is not held to 44 px.
    expect(said).not.toContain('[inline] "the terms": target');
    await page.close();
  });

  for (const vp of viewports) {
    it(`signed-out screens (${vp.name} ${vp.width}×${vp.height})`, async () => {
      const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
      const page = await context.newPage();
      const w = watch(page);
      const problems: string[] = [];
      for (const [path, name] of [
        ['/sign-in', 'sign-in'],
        ['/forgot-password', 'forgotten password'],
        ['/reset-password?token=not-a-real-token', 'reset password'],
        ['/accept-invitation?token=not-a-real-token', 'accept invitation'],
      ] as const) {
        await page.goto(`${base}${path}`);
        await checkScreen(page, `${name} (${vp.name})`, vp, problems);
      }
      report(problems, w.errors);
      await context.close();
    }, 300_000);

    for (const role of Object.keys(screensOf) as Role[]) {
      it(`${roleLabels[role]}: sign in, navigate and open a request by keyboard (${vp.name} ${vp.width}×${vp.height})`, async () => {
        const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
        const page = await context.newPage();
        const w = watch(page);
        const problems: string[] = [];
        await signInByKeyboard(page, role, problems, vp);

        for (const s of screensOf[role]) {
          await page.goto(`${base}${s.path}`);
          await checkScreen(page, `${roleLabels[role]} ${s.name} (${vp.name})`, vp, problems);
          // The navigation says which of its destinations this is.
          const current = await page.evaluate<string[]>(`Array.from(document.querySelectorAll('[data-testid^="nav-"][aria-current="page"]')).map((e) => e.getAttribute('data-testid'))`);
          if (current.length !== 1) problems.push(`${roleLabels[role]} ${s.name} (${vp.name}): the navigation marks ${current.length} items as the current page (${current.join(', ')}), not one`);
          // What a screen folds away is checked opened, opened from the keyboard.
          for (const toggle of s.opens ?? []) {
            await page.goto(`${base}${s.path}`);
            await settled(page);
            if ((await page.getByTestId(toggle).count()) === 0) continue;
            await tabTo(page, toggle);
            await page.keyboard.press('Enter');
            await checkScreen(page, `${roleLabels[role]} ${s.name} opened with [${toggle}] (${vp.name})`, vp, problems);
          }
        }

        // The request this desk works on: opened by keyboard from the desk where there is one.
        if (deskHolders.includes(role) && role !== 'field_inspector') {
          await openRequestByKeyboard(page, vp);
          // Tab from the top of the screen the keyboard opened (focus is left on the card).
          await page.reload();
          await checkScreen(page, `${roleLabels[role]} request ${vp.name === 'wide' ? 'beside the desk' : 'detail'} (${vp.name})`, vp, problems);
        }
        const id = await someRequestId(page, deskHolders.includes(role));
        await page.goto(`${base}/requests/${id}`);
        await checkScreen(page, `${roleLabels[role]} request detail page (${vp.name})`, vp, problems);
        // Each move this desk may make, chosen with Space, shows its own form: checked too.
        const moves = await page.evaluate<string[]>(`Array.from(document.querySelectorAll('[role="radio"][data-testid^="action-"]')).map((e) => e.getAttribute('data-testid'))`);
        for (const move of moves) {
          await page.goto(`${base}/requests/${id}`);
          await settled(page);
          await page.getByTestId(move).focus();
          await page.keyboard.press('Space');
          await expect.poll(() => page.getByTestId(move).getAttribute('aria-checked')).toBe('true');
          await checkScreen(page, `${roleLabels[role]} request detail, move [${move}] chosen (${vp.name})`, vp, problems);
        }
        if (role === 'auditor') {
          await page.goto(`${base}/trail/${id}`);
          await checkScreen(page, `${roleLabels[role]} request trail (${vp.name})`, vp, problems);
        }

        // The navigation answers Enter: to the register and back home.
        await page.goto(`${base}/register`);
        await settled(page);
        const home = screensOf[role][0]!;
        const homeKey = home.path === '/' ? 'nav-desk' : home.path === '/trail' ? 'nav-trail' : 'nav-people';
        await tabTo(page, homeKey);
        await page.screenshot({ path: join(artifactsDir(), `accessibility-focus-${role}-${vp.name}.png`) });
        await page.keyboard.press('Enter');
        await expect.poll(() => new URL(page.url()).pathname).toBe(home.path);

        report(problems, w.errors);
        await context.close();
      }, 300_000);
    }

    // Screens other people are finishing; kept apart so their problems are named on their own.
    it(`Contractor: the new request screen (${vp.name} ${vp.width}×${vp.height})`, async () => {
      const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
      const page = await context.newPage();
      const w = watch(page);
      const problems: string[] = [];
      await signInByKeyboard(page, 'contractor', [], vp);
      await page.goto(`${base}/requests/new`);
      await checkScreen(page, `Contractor New request (${vp.name})`, vp, problems);
      report(problems, w.errors);
      await context.close();
    }, 300_000);

    // Each kind of request, driven by keyboard to its own departure step; each step checked as it
    // first shows and again after Next refused it, with the errors in place.
    it(`Contractor: the new request's steps for every kind (${vp.name} ${vp.width}×${vp.height})`, async () => {
      const problems: string[] = [];
      const errors: string[] = [];
      for (const type of ['deck_placement_change', 'construction_joint_relocation', 'joint_seal_substitution', 'other_deviation']) {
        // A context of its own, so no draft kept on the device from the last kind is offered.
        const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
        const page = await context.newPage();
        const w = watch(page);
        await signInByKeyboard(page, 'contractor', [], vp);
        await page.goto(`${base}/requests/new`);
        await settled(page);
        await page.getByTestId(`filing-type-${type}`).focus();
        await page.keyboard.press('Space');
        await expect.poll(() => page.getByTestId(`filing-type-${type}`).getAttribute('aria-checked')).toBe('true');
        const next = async (expected: string | null) => {
          await tabTo(page, 'filing-next');
          await page.keyboard.press('Enter');
          if (expected) await expect.poll(() => page.getByTestId('filing-step').textContent(), { timeout: 10_000 }).toBe(expected);
          else await expect.poll(() => page.locator('[role="alert"]').count(), { timeout: 10_000 }).toBeGreaterThan(0);
        };
        const at = (step: string) => `Contractor New request, ${type}, ${step} (${vp.name})`;
        await next('Step 2 of 5: What and where');
        if (type === 'deck_placement_change') {
          await checkScreen(page, at('what and where'), vp, problems);
          await next(null);
          await checkScreen(page, at('what and where, refused'), vp, problems);
        }
        for (const [id, value] of Object.entries({ 'filing-title': 'Accessibility walk', 'filing-location': 'Pier 2, north fascia', 'filing-span': '2', 'filing-station': '12+40', 'filing-plan-sheets': 'S-12' })) {
          await page.getByTestId(id).fill(value);
        }
        await next('Step 3 of 5: The departure');
        await checkScreen(page, at('the departure'), vp, problems);
        await next(null);
        await checkScreen(page, at('the departure, refused'), vp, problems);
        errors.push(...w.errors);
        await context.close();
      }
      report(problems, errors);
    }, 600_000);

    for (const role of ['field_inspector', 'section_engineer'] as const) {
      it(`${roleLabels[role]}: the conditions screen (${vp.name} ${vp.width}×${vp.height})`, async () => {
        const context = await browser.newContext({ viewport: { width: vp.width, height: vp.height } });
        const page = await context.newPage();
        const w = watch(page);
        const problems: string[] = [];
        await signInByKeyboard(page, role, [], vp);
        await page.goto(`${base}/conditions`);
        await checkScreen(page, `${roleLabels[role]} Conditions (${vp.name})`, vp, problems);
        report(problems, w.errors);
        await context.close();
      }, 300_000);
    }
  }
});
