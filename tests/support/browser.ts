// Debian's Chromium driven by playwright-core; never a downloaded browser. Playwright gives each
// launch a fresh, empty profile of its own.
import { chromium, type Browser } from 'playwright-core';

export async function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}
