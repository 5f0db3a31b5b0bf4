// The web app's weight and first paint of work: the exported JavaScript (what index.html loads
// first, and everything), raw and gzip; and in headless Chromium the time from navigation to the
// first card of My desk on screen, median of five cold loads (a fresh browser context each: no
// cache, no service worker), signed in as the desk engineer.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';

export type WebFigures = {
  initialJs: { files: string[]; rawKb: number; gzipKb: number };
  allJs: { files: number; rawKb: number; gzipKb: number };
  firstDesk: { loadsMs: number[]; medianMs: number };
};

const kb = (bytes: number) => Number((bytes / 1024).toFixed(1));

function jsFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return jsFiles(path);
    return name.endsWith('.js') ? [path] : [];
  });
}

function weigh(paths: string[]) {
  let raw = 0;
  let gz = 0;
  for (const p of paths) {
    const bytes = readFileSync(p);
    raw += bytes.length;
    gz += gzipSync(bytes).length;
  }
  return { rawKb: kb(raw), gzipKb: kb(gz) };
}

export function bundleFigures(dist: string): Omit<WebFigures, 'firstDesk'> {
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const initial = [...html.matchAll(/<script[^>]+src="([^"]+\.js)"/g)].map((m) => m[1]!);
  const all = jsFiles(join(dist, '_expo'));
  return {
    initialJs: { files: initial, ...weigh(initial.map((src) => join(dist, src))) },
    allJs: { files: all.length, ...weigh(all) },
  };
}

// Runs in the page, where performance.now() counts from the start of the navigation. A function
// (not a string, which the page's CSP refuses to evaluate); the DOM is reached through globalThis
// as the server type check has no DOM types.
function firstCardShown(): number | null {
  const page = globalThis as unknown as { document: { querySelector(s: string): { children: { length: number } } | null } };
  const list = page.document.querySelector('[data-testid="desk-waiting"]');
  return list && list.children.length > 0 ? performance.now() : null;
}

export async function firstDeskFigures(base: string, cookie: string, loads = 5): Promise<WebFigures['firstDesk']> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const url = new URL(base);
  const cookies = cookie.split('; ').map((pair) => {
    const at = pair.indexOf('=');
    return { name: pair.slice(0, at), value: pair.slice(at + 1), domain: url.hostname, path: '/', httpOnly: true, sameSite: 'Lax' as const };
  });
  const loadsMs: number[] = [];
  try {
    for (let i = 0; i < loads; i++) {
      const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
      await context.addCookies(cookies);
      const page = await context.newPage();
      await page.goto(`${base}/`, { waitUntil: 'commit' });
      const handle = await page.waitForFunction(firstCardShown, undefined, { polling: 'raf', timeout: 30_000 });
      loadsMs.push(Math.round((await handle.jsonValue()) as number));
      await context.close();
    }
  } finally {
    await browser.close();
  }
  const sorted = [...loadsMs].sort((a, b) => a - b);
  return { loadsMs, medianMs: sorted[Math.floor(sorted.length / 2)]! };
}
